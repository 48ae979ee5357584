import express, { type Router } from 'express';
import { existsSync } from 'node:fs';
import path from 'node:path';

/** Serves the built web app; every non-API path gets index.html so the browser router can take it. */
export function webApp(distDir: string): Router {
  const router = express.Router();
  const root = path.resolve(distDir);
  const index = path.join(root, 'index.html');
  // Hashed asset names never change content, so browsers may keep them; index.html must always be fresh.
  router.use('/assets', express.static(path.join(root, 'assets'), { immutable: true, maxAge: '1y', fallthrough: false }));
  router.use(express.static(root, { index: false, maxAge: '1h' }));
  router.get('/{*path}', (_req, res) => {
    if (!existsSync(index)) {
      res.status(503).type('text/plain').send('The web app has not been built yet: run `npm run build` (npm start does it for you).');
      return;
    }
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(index);
  });
  return router;
}
