import { Injectable } from '@nestjs/common';
import { ThrottlerGuard } from '@nestjs/throttler';

/** Limits verification look-ups per client address, so codes cannot be enumerated. */
@Injectable()
export class VerifyThrottlerGuard extends ThrottlerGuard {
  protected override async getTracker(req: Record<string, unknown>): Promise<string> {
    return `verify|${String(req.ip)}`;
  }
}

/** Look-ups per minute per address (VERIFY_RATE_LIMIT, default 30). */
export const verifyLimit = (): number => {
  const n = Number(process.env.VERIFY_RATE_LIMIT);
  return Number.isInteger(n) && n > 0 ? n : 30;
};
