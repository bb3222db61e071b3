import { randomUUID } from 'node:crypto';
import type { IncomingMessage, ServerResponse } from 'node:http';

import type { Request, RequestHandler, Response } from 'express';
import type { Logger } from 'pino';
import { pinoHttp } from 'pino-http';

import { addressNetwork, userIdHash } from './logger';
import { httpDuration } from './metrics';

/** A request id from the proxy (nginx's `$request_id`) is kept when it looks like one. */
const FORWARDED_ID = /^[A-Za-z0-9-]{8,64}$/;
/** Probes poll these; their lines are logged at debug only. */
const PROBES = new Set(['/api/health', '/api/ready', '/metrics']);

/**
 * The route pattern (`/api/uploads/:id`), never the URL itself, so metrics stay few and logs
 * hold no ids or query strings. Read while the handler answers: Express resets `baseUrl` once
 * a router is left.
 */
function routeOf(req: Request): string {
  const pattern = (req.route as { path?: unknown } | undefined)?.path;
  if (typeof pattern === 'string') {
    if (pattern === '/{*splat}') return 'app';
    return `${req.baseUrl}${pattern === '/' ? '' : pattern}` || '/';
  }
  return req.path.startsWith('/api/') || req.path === '/api' ? 'unmatched' : 'static';
}

const routeLabel = (res: ServerResponse): string => ((res as Response).locals?.['route'] as string | undefined) ?? 'unmatched';

/**
 * One JSON line per request (pino-http): request id, method, route pattern, status, time, the
 * client's network (not its full address) and a hash of the caller's user id. Headers, bodies
 * and query strings are never logged, so no password, token, e-mail or journal text can reach
 * the log. Also times each request for `lamplight_http_request_duration_seconds`.
 */
export function requestLog(logger: Logger): RequestHandler {
  const logRequest = pinoHttp({
    logger,
    wrapSerializers: false,
    quietReqLogger: true,
    genReqId(req: IncomingMessage, res: ServerResponse) {
      const forwarded = req.headers['x-request-id'];
      const id = typeof forwarded === 'string' && FORWARDED_ID.test(forwarded) ? forwarded : randomUUID();
      res.setHeader('X-Request-Id', id);
      return id;
    },
    serializers: {
      req: (req: Request) => ({ id: req.id, method: req.method, path: req.path, network: addressNetwork(req.ip) }),
      res: (res: ServerResponse) => ({ status: res.statusCode }),
      err: (err: Error) => ({ type: err.name }),
    },
    customProps(_req: IncomingMessage, res: ServerResponse) {
      const route = (res as Response).locals?.['route'] as string | undefined;
      const caller = (res as Response).locals?.['caller'] as { userId?: string } | undefined;
      return {
        ...(route ? { route } : {}),
        ...(caller?.userId ? { user: userIdHash(caller.userId) } : {}),
      };
    },
    customLogLevel(req: IncomingMessage, res: ServerResponse, err?: Error) {
      if (err || res.statusCode >= 500) return 'error';
      return PROBES.has((req as Request).originalUrl.split('?')[0]!) ? 'debug' : 'info';
    },
    customSuccessMessage: (req: IncomingMessage, res: ServerResponse) => `${req.method} ${routeLabel(res)} ${res.statusCode}`,
    customErrorMessage: (req: IncomingMessage, res: ServerResponse) => `${req.method} ${routeLabel(res)} ${res.statusCode}`,
  });

  return (req, res, next) => {
    const started = process.hrtime.bigint();
    const writeHead = res.writeHead;
    res.writeHead = function (this: Response, ...args: unknown[]) {
      res.locals['route'] ??= routeOf(req);
      return (writeHead as (...a: unknown[]) => Response).apply(this, args);
    } as typeof res.writeHead;
    res.once('finish', () => {
      // An event stream lasts as long as the reader stays; its duration is not a response time.
      if (String(res.getHeader('content-type') ?? '').startsWith('text/event-stream')) return;
      const seconds = Number(process.hrtime.bigint() - started) / 1e9;
      httpDuration.observe({ method: req.method, route: routeLabel(res), status: String(res.statusCode) }, seconds);
    });
    logRequest(req, res, next);
  };
}
