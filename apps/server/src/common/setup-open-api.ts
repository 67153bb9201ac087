/** Mounts the OpenAPI document at /api/docs (UI) and /api/docs-json. */
import type { INestApplication } from '@nestjs/common';
import { DocumentBuilder, SwaggerModule } from '@nestjs/swagger';
import { HEXLOOM_VERSION } from '@hexloom/contracts';
import { SESSION_COOKIE } from '../auth/session-cookie.js';

/** Builds the document from the controllers' decorators and serves it. */
export function setupOpenApi(app: INestApplication): void {
  const config = new DocumentBuilder()
    .setTitle('Hexloom API')
    .setDescription('Teams, members, invitations and sign-in of Hexloom. Errors are JSON { statusCode, error, message, issues? }.')
    .setVersion(HEXLOOM_VERSION)
    .addCookieAuth(SESSION_COOKIE)
    .build();
  const document = SwaggerModule.createDocument(app, config);
  SwaggerModule.setup('api/docs', app, document, { jsonDocumentUrl: 'api/docs-json', customSiteTitle: 'Hexloom API' });
}
