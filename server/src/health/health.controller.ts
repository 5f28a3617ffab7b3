import { apiRoutes } from '@holdfast/shared';
import { Controller, Get, Res } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { Health } from '@holdfast/shared';
import type { Response } from 'express';
import { serverVersion } from '../config/paths.js';
import { Public } from '../auth/policy.js';
import { DATABASE_RETRY_AFTER_SECONDS } from '../common/errors/postgres-errors.js';
import { HealthRepository } from './health.repository.js';

const DATABASE_TIMEOUT_MS = 1000;

@ApiTags('health')
@Controller()
export class HealthController {
  constructor(private readonly repo: HealthRepository) {}

  /** 200 when PostgreSQL answers `select 1` within a second, else 503. Never an error body. */
  @Get(apiRoutes.health.path)
  @Public()
  async check(@Res({ passthrough: true }) res: Response): Promise<Health> {
    const up = await this.databaseAnswers();
    res.status(up ? 200 : 503).setHeader('Cache-Control', 'no-store');
    if (!up) res.setHeader('Retry-After', String(DATABASE_RETRY_AFTER_SECONDS));
    return up
      ? { status: 'ok', database: 'ok', version: serverVersion }
      : { status: 'degraded', database: 'down', version: serverVersion };
  }

  private async databaseAnswers(): Promise<boolean> {
    let timer: NodeJS.Timeout | undefined;
    const timeout = new Promise<false>((resolve) => {
      timer = setTimeout(() => resolve(false), DATABASE_TIMEOUT_MS);
    });
    const query = this.repo
      .ping()
      .then(() => true)
      .catch(() => false);
    try {
      return await Promise.race([query, timeout]);
    } finally {
      clearTimeout(timer);
    }
  }
}
