import type { AppSettings } from './env.js';

/** Injectable settings of this server instance (see env.ts for every variable and default). */
export class AppConfig {
  constructor(readonly settings: AppSettings) {}

  get secureCookies(): boolean {
    return this.settings.PUBLIC_URL.startsWith('https://');
  }
}
