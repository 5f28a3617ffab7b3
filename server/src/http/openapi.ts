import type { INestApplication } from '@nestjs/common';
import { DocumentBuilder, SwaggerModule } from '@nestjs/swagger';
import type { NextFunction, Request, Response } from 'express';
import { AccessVerifier } from '../auth/access-verifier.js';
import type { AppSettings } from '../config/env.js';
import { serverVersion } from '../config/paths.js';

/**
 * OpenAPI document at /api/docs (UI) and /api/docs-json, generated from the controllers. With
 * API_DOCS=signed-in (the default under NODE_ENV=production) both answer only a request that
 * carries a signed-in user's bearer token, so the API's map is not public.
 */
export function setupOpenApi(app: INestApplication, settings: AppSettings): void {
  if (settings.API_DOCS === 'signed-in') {
    const verifier = app.get(AccessVerifier);
    const requireSignIn = (req: Request, res: Response, next: NextFunction) => {
      verifier.fromHeader(req.headers.authorization).then(
        () => next(),
        () =>
          res.status(401).json({
            error: {
              code: 'unauthenticated',
              message: 'The API documentation needs a signed-in user (Authorization: Bearer …).',
            },
          }),
      );
    };
    app.use(['/api/docs', '/api/docs-json'], requireSignIn);
  }
  const config = new DocumentBuilder()
    .setTitle('Holdfast API')
    .setDescription('Calculation sheets for industrial brakes: sign-in, users, sheets, revisions.')
    .setVersion(serverVersion)
    .addBearerAuth()
    .build();
  const document = SwaggerModule.createDocument(app, config);
  SwaggerModule.setup('api/docs', app, document, { jsonDocumentUrl: 'api/docs-json' });
}
