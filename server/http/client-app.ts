import path from 'node:path';
import { existsSync } from 'node:fs';
import express, { Router } from 'express';

/**
 * Serves the built client and falls back to index.html for every non-API path, so client-side
 * routes survive a reload. Missing build → a plain hint instead of a blank page.
 */
export function clientApp(clientDir: string): Router {
  const router = Router();
  const indexHtml = path.join(clientDir, 'index.html');
  router.use(express.static(clientDir, { index: false, maxAge: '1h' }));
  router.get(/.*/, (_req, res) => {
    if (existsSync(indexHtml)) res.sendFile(indexHtml);
    else res.status(503).type('text').send('The client is not built yet: run `npm run build`.');
  });
  return router;
}
