import type { RequestHandler } from 'express';
import { rateLimit, type Store } from 'express-rate-limit';

import { callerOf } from './require-auth';
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
    // X-Forwarded-For from an untrusted peer is ignored on purpose (LAMPLIGHT_TRUST_PROXY).
    validate: { xForwardedForHeader: false },
    handler: (_req, res) => {
      res.status(429).json({
        error: { code: 'too_many_attempts', message: 'Too many attempts; wait a few minutes and try again', details: null },
      });
    },
  });
}

/**
 * Limits requests per signed-in reader (after requireAuth), whichever address or device they
 * come from; counted in PostgreSQL like the attempt limit, so every instance shares the count.
 */
export function readerLimiter(what: string, limit: number, windowMs: number, store: Store, methods?: readonly string[]): RequestHandler {
  const limiter = rateLimit({
    store,
    windowMs,
    limit,
    keyGenerator: (_req, res) => callerOf(res).userId,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    validate: { xForwardedForHeader: false },
    handler: (_req, res) => {
      res.status(429).json({
        error: { code: 'too_many_requests', message: `Too many ${what} requests from this account; wait a minute and try again`, details: null },
      });
    },
  });
  return methods ? (req, res, next) => (methods.includes(req.method) ? limiter(req, res, next) : next()) : limiter;
}

/** Token, account and pull answers must not be kept by any cache (RFC 9111 §5.2.2.5). */
export const noStore: RequestHandler = (_req, res, next) => {
  res.set('Cache-Control', 'no-store');
  next();
};
