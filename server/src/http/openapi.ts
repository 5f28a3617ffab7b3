import type { INestApplication } from '@nestjs/common';
import { DocumentBuilder, SwaggerModule } from '@nestjs/swagger';
import { serverVersion } from '../config/paths.js';

/** OpenAPI document at /api/docs (UI) and /api/docs-json, generated from the controllers. */
export function setupOpenApi(app: INestApplication): void {
  const config = new DocumentBuilder()
    .setTitle('Holdfast API')
    .setDescription('Calculation sheets for industrial brakes: sign-in, users, sheets, revisions.')
    .setVersion(serverVersion)
    .addBearerAuth()
    .build();
  const document = SwaggerModule.createDocument(app, config);
  SwaggerModule.setup('api/docs', app, document, { jsonDocumentUrl: 'api/docs-json' });
}
