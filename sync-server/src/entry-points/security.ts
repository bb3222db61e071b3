import type { RequestHandler } from 'express';
import { rateLimit, type Store } from 'express-rate-limit';
import helmet from 'helmet';

/**
 * Security headers. The Content-Security-Policy is one the app itself satisfies: scripts, fonts,
 * styles, images and connections from our own origin only, no inline scripts. Inline styles are
 * allowed because Angular and Material add component styles at run time (common practice for
 * Angular apps without a per-request nonce, which a service-worker-cached index.html cannot carry).
 */
export function securityHeaders(): RequestHandler {
  return helmet({
    contentSecurityPolicy: {
      useDefaults: false,
      directives: {
        defaultSrc: ["'self'"],
        scriptSrc: ["'self'"],
        styleSrc: ["'self'", "'unsafe-inline'"],
        imgSrc: ["'self'", 'data:', 'blob:'],
        fontSrc: ["'self'"],
        connectSrc: ["'self'"],
        workerSrc: ["'self'"],
        manifestSrc: ["'self'"],
        mediaSrc: ["'self'", 'blob:'],
        objectSrc: ["'none'"],
        baseUri: ["'self'"],
        formAction: ["'self'"],
        frameAncestors: ["'none'"],
        scriptSrcAttr: ["'none'"],
      },
    },
    // Covers, once uploaded, are shown by other devices of the same reader: same origin only.
    crossOriginResourcePolicy: { policy: 'same-origin' },
  });
}

/**
 * Limits attempts per client address on sign-in, registration and reset routes. The count is
 * kept in `store` (PostgreSQL in the app), so instances behind a load balancer share it.
 */
export function attemptLimiter(limitPer15Minutes: number, store: Store): RequestHandler {
  return rateLimit({
    store,
    windowMs: 15 * 60 * 1000,
    limit: limitPer15Minutes,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, res) => {
      res.status(429).json({
        error: { code: 'too_many_attempts', message: 'Too many attempts; wait a few minutes and try again', details: null },
      });
    },
  });
}
