import { NestFactory } from '@nestjs/core';
import type { NestExpressApplication } from '@nestjs/platform-express';
import cookieParser from 'cookie-parser';
import { pinoHttp } from 'pino-http';
import type { Logger } from 'pino';
import { AppModule } from './app.module.js';
import { AppConfig } from './config/app-config.js';
import type { AppSettings } from './config/env.js';
import { JSON_BODY_LIMIT_BYTES } from './http/body-limits.js';
import { setupOpenApi } from './http/openapi.js';
import { securityHeaders } from './http/security.js';
import { serveUi } from './http/spa.js';
import { createLogger } from './logging/logger.js';
import { PinoLoggerService } from './logging/pino-logger.service.js';

export interface CreatedApp {
  app: NestExpressApplication;
  logger: Logger;
  uiServed: boolean;
}

/** Builds the whole HTTP application (not yet listening); used by main.ts and the tests. */
export async function createApp(settings: AppSettings): Promise<CreatedApp> {
  const logger = createLogger(settings.LOG_LEVEL);
  const app = await NestFactory.create<NestExpressApplication>(AppModule.forRoot(settings), {
    bodyParser: false,
    logger: new PinoLoggerService(logger),
  });
  app.disable('x-powered-by');
  // Behind a reverse proxy, req.ip (sign-in throttling, logs) must come from X-Forwarded-For.
  app.set('trust proxy', new AppConfig(settings).trustProxy);
  app.use(securityHeaders());
  app.use(
    pinoHttp({
      logger,
      autoLogging: { ignore: (req) => req.url === '/api/health' },
      customLogLevel: (_req, res, err) => (err || res.statusCode >= 500 ? 'error' : 'info'),
      // One short line per request: the full request and response headers made each line
      // about 1.3 KB of JSON, a tenth of a signed-in read's time (docs/performance.md).
      serializers: {
        req: (req: { id: unknown; method: string; url: string; remoteAddress: string }) => ({
          id: req.id,
          method: req.method,
          url: req.url,
          remoteAddress: req.remoteAddress,
        }),
        res: (res: { statusCode: number }) => ({ statusCode: res.statusCode }),
      },
    }),
  );
  app.useBodyParser('json', { limit: JSON_BODY_LIMIT_BYTES });
  app.use(cookieParser());
  app.setGlobalPrefix('api');
  setupOpenApi(app, settings);
  const uiServed = serveUi(app, settings.UI_DIST);
  return { app, logger, uiServed };
}
