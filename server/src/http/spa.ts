import { existsSync } from 'node:fs';
import path from 'node:path';
import type { NestExpressApplication } from '@nestjs/platform-express';
import type { NextFunction, Request, Response } from 'express';

/**
 * Serves the built UI at / and answers index.html for client-side routes. /api stays with Nest,
 * so an unknown /api path is a JSON 404, never the app page. Returns false when no UI is built.
 */
export function serveUi(app: NestExpressApplication, uiDist: string): boolean {
  const index = path.join(uiDist, 'index.html');
  if (!existsSync(index)) return false;
  app.useStaticAssets(uiDist, { index: false, maxAge: '1h', fallthrough: true });
  app.use((req: Request, res: Response, next: NextFunction) => {
    const isApi = req.path === '/api' || req.path.startsWith('/api/');
    if ((req.method !== 'GET' && req.method !== 'HEAD') || isApi) return next();
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(index);
  });
  return true;
}
