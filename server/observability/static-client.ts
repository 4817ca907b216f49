import { join } from 'node:path';
import express, { type Express } from 'express';

/** Vite's content-hashed output: a new release gets new names, so these never need revalidating. */
const HASHED_ASSET = /\/assets\//;

/**
 * Serves the built client: hashed assets `public, max-age=31536000, immutable`; `index.html` (and the
 * SPA fallback that returns it) `no-cache`, so a phone asks again on every open and picks up a new
 * release at once; other public files (icons, manifest) an hour.
 */
export function serveClient(app: Express, clientDir: string) {
  const indexFile = join(clientDir, 'index.html');
  app.use(
    express.static(clientDir, {
      index: false,
      setHeaders(res, path) {
        if (path === indexFile || path.endsWith('.html')) res.setHeader('Cache-Control', 'no-cache');
        else if (HASHED_ASSET.test(path.replaceAll('\\', '/'))) res.setHeader('Cache-Control', 'public, max-age=31536000, immutable');
        else res.setHeader('Cache-Control', 'public, max-age=3600');
      },
    }),
  );
  app.get('/{*path}', (_req, res) => {
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(indexFile);
  });
}
