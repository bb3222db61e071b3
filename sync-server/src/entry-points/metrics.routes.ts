import { createHash, timingSafeEqual } from 'node:crypto';
import { isIP } from 'node:net';

import { Router, type Request } from 'express';
import type { DataSource } from 'typeorm';

import { AppError } from '../errors';
import { refreshQueryGauges, registry } from '../observability/metrics';

/**
 * `GET /metrics` in Prometheus' text format, for loopback callers (a scraper on the same host)
 * or anyone with `Authorization: Bearer <LAMPLIGHT_METRICS_TOKEN>`. Anyone else gets a 404, so
 * the route is not advertised.
 */
export function metricsRoutes(dataSource: DataSource, token: string | null): Router {
  const router = Router();
  router.get('/metrics', async (req, res) => {
    if (!fromLoopback(req) && !hasToken(req, token)) throw new AppError(404, 'not_found', `No route GET /metrics`);
    await refreshQueryGauges(dataSource);
    res.setHeader('Cache-Control', 'no-store');
    res.type(registry.contentType).send(await registry.metrics());
  });
  return router;
}

/**
 * The caller is on this host. Behind a proxy, that is the address the trusted proxy forwarded;
 * an X-Forwarded-For from a peer we do not trust (or forged by a client) never counts as local.
 */
function fromLoopback(req: Request): boolean {
  const peer = req.socket.remoteAddress ?? '';
  const forwarded = req.headers['x-forwarded-for'] !== undefined;
  const trusts = req.app.get('trust proxy fn') as (address: string, hop: number) => boolean;
  if (forwarded && !trusts(peer, 0)) return false;
  return isLoopback(forwarded ? (req.ip ?? '') : peer);
}

function isLoopback(address: string): boolean {
  const plain = address.startsWith('::ffff:') ? address.slice(7) : address;
  if (isIP(plain) === 4) return plain.startsWith('127.');
  return plain === '::1';
}

function hasToken(req: Request, token: string | null): boolean {
  const header = req.headers.authorization;
  if (!token || !header?.startsWith('Bearer ')) return false;
  const digest = (text: string) => createHash('sha256').update(text).digest();
  return timingSafeEqual(digest(header.slice(7)), digest(token));
}
