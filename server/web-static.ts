import fs from 'node:fs';
import path from 'node:path';
import express from 'express';
import type { Router } from 'express';

/**
 * Serves the exported web app: hashed assets with a long cache, and index.html for every other
 * GET that is not an API call, so deep links like /trips/abc load the app shell.
 */
export function webStatic(webDir: string): Router | undefined {
  const root = path.resolve(webDir);
  const shell = path.join(root, 'index.html');
  if (!fs.existsSync(shell)) return undefined;
  const router = express.Router();
  router.use(
    express.static(root, {
      index: false,
      setHeaders(res, filePath) {
        const hashed =
          filePath.includes(`${path.sep}_expo${path.sep}`) || filePath.includes(`${path.sep}assets${path.sep}`);
        res.setHeader('Cache-Control', hashed ? 'public, max-age=31536000, immutable' : 'no-cache');
      },
    }),
  );
  router.get(/^(?!\/api(\/|$)).*/, (_req, res) => {
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(shell);
  });
  return router;
}
