import { existsSync } from 'node:fs';
import path from 'node:path';

import { Router } from 'express';
import expressStaticGzip from 'express-static-gzip';

/**
 * Serves the built Angular app from the same origin as the API. Hashed bundles are cached for a
 * year; `index.html` and the service worker files are always revalidated so updates are seen.
 * Any other non-API path falls back to `index.html` for the client router, except a path that
 * names a file (it has an extension): a missing file is a 404, not the app's page, so crawlers,
 * browsers and auditors see what is really missing.
 */
/** The last path segment has an extension (`main-XYZ.js`, `favicon.ico`); client routes never do. */
const FILE_NAME = /\/[^/]*\.[A-Za-z0-9]{1,8}$/;

export function staticApp(appDir: string): Router {
  const root = path.resolve(appDir);
  const indexFile = path.join(root, 'index.html');
  if (!existsSync(indexFile)) {
    throw new Error(`No built app in ${appDir} (run: npm run build)`);
  }
  const router = Router();
  // Files compressed at build time (scripts/precompress.mjs) are sent as they are: brotli when
  // the browser takes it, else gzip, else the plain file.
  router.use(
    expressStaticGzip(root, {
      index: false,
      enableBrotli: true,
      orderPreference: ['br', 'gzip'],
      serveStatic: {
        setHeaders(res, filePath) {
          const name = path.basename(filePath);
          // esbuild hashes are 8 of [A-Z0-9]; the build's chunk optimiser (Rollup) writes base64url ones.
          if (/-[\w-]{8}\.(js|css|woff2?)(\.(br|gz))?$/.test(name)) {
            res.setHeader('Cache-Control', 'public, max-age=31536000, immutable');
          } else {
            res.setHeader('Cache-Control', 'no-cache');
          }
        },
      },
    }),
  );
  router.get('/{*splat}', (req, res, next) => {
    if (req.path.startsWith('/api/') || req.path === '/api') return next();
    if (FILE_NAME.test(req.path)) {
      res.status(404).type('text/plain').send('Not found');
      return;
    }
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(indexFile);
  });
  return router;
}
