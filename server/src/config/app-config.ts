import type { AppSettings } from './env.js';

/** Injectable settings of this server instance (see env.ts for every variable and default). */
export class AppConfig {
  constructor(readonly settings: AppSettings) {}

  /** The value for Express's `trust proxy` setting. */
  get trustProxy(): boolean | number | string {
    const v = this.settings.TRUST_PROXY;
    if (v === 'true') return true;
    if (v === 'false') return false;
    if (/^\d+$/.test(v)) return Number(v);
    return v;
  }

  get secureCookies(): boolean {
    return this.settings.PUBLIC_URL.startsWith('https://');
  }
}
