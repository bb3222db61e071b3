import compression from 'compression';
import type { RequestHandler } from 'express';

/**
 * gzip for API answers (a pull page of JSON shrinks several times), never for an event stream:
 * Server-Sent Events must reach the client as each event is written.
 */
export function compressApi(): RequestHandler {
  return compression({
    filter: (req, res) => !String(res.getHeader('Content-Type') ?? '').startsWith('text/event-stream') && compression.filter(req, res),
  });
}
