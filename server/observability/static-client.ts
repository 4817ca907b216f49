import { join } from 'node:path';
import express, { type Express } from 'express';

/** Vite's content-hashed output: a new release gets new names, so these never need revalidating. */
const HASHED_ASSET = /\/assets\//;

/**
 * The photo tracer's worker runs opencv.js, whose WebAssembly bindings build functions from strings: only
 * that worker's script gets a policy allowing it (a dedicated worker follows the policy sent with its own
 * script). It has no page, no DOM and no cookies to read; it sees only the photo's pixels.
 */
const TRACE_WORKER = /\/assets\/photo-trace\.worker-[^/]*\.js$/;
const TRACE_WORKER_CSP = "default-src 'self'; script-src 'self' 'unsafe-eval' 'wasm-unsafe-eval'; connect-src 'self'; object-src 'none'";

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
        if (TRACE_WORKER.test(path.replaceAll('\\', '/'))) res.setHeader('Content-Security-Policy', TRACE_WORKER_CSP);
      },
    }),
  );
  app.get('/{*path}', (_req, res) => {
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(indexFile);
  });
}
