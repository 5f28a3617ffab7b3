/** Counts what each user has in progress, and refuses the one that would pass the limit. */
export class PerUserLimit {
  private readonly inFlight = new Map<string, number>();

  constructor(readonly limit: number) {}

  /** Takes a slot for `userId`, or returns null when the user already holds `limit` of them. */
  acquire(userId: string): (() => void) | null {
    const held = this.inFlight.get(userId) ?? 0;
    if (held >= this.limit) return null;
    this.inFlight.set(userId, held + 1);
    let released = false;
    return () => {
      if (released) return;
      released = true;
      const now = (this.inFlight.get(userId) ?? 1) - 1;
      if (now <= 0) this.inFlight.delete(userId);
      else this.inFlight.set(userId, now);
    };
  }

  held(userId: string): number {
    return this.inFlight.get(userId) ?? 0;
  }
}
