import fs from 'node:fs';
import path from 'node:path';

import express, { type Router } from 'express';

/**
 * Serves the exported web app; any other GET outside /api gets index.html so that a deep link
 * such as /works/12 loads the app, whose router takes it from there.
 */
export function webApp(webRoot: string): Router {
  const root = path.resolve(webRoot);
  const index = path.join(root, 'index.html');
  const router = express.Router();
  router.use(express.static(root, { index: false, maxAge: '1h' }));
  router.get('/{*splat}', (_req, res) => {
    if (!fs.existsSync(index)) {
      res.status(503).type('text').send('The web app is not built yet: run `npm run build:web`.');
      return;
    }
    res.set('Cache-Control', 'no-cache').sendFile(index);
  });
  return router;
}
