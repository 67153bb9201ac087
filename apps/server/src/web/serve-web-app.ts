/** Serves the built web app: static files, and index.html for any other non-/api GET (SPA fallback). */
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import type { INestApplication } from '@nestjs/common';
import express, { type NextFunction, type Request, type Response } from 'express';

/** Registers the static and fallback middleware; returns false when `distDir` has no index.html. */
export function serveWebApp(app: INestApplication, distDir: string): boolean {
  const indexHtml = join(distDir, 'index.html');
  if (!existsSync(indexHtml)) return false;
  app.use(express.static(distDir, { index: false, maxAge: '1h' }));
  app.use((req: Request, res: Response, next: NextFunction) => {
    const isPage = (req.method === 'GET' || req.method === 'HEAD') && req.path !== '/api' && !req.path.startsWith('/api/');
    if (!isPage) return next();
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(indexHtml);
  });
  return true;
}
