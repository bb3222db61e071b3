import { constants } from 'node:zlib';

import compression from 'compression';
import type { RequestHandler } from 'express';

/**
 * gzip or brotli for API answers (a pull page of JSON shrinks about 14 times), never for an event
 * stream: Server-Sent Events must reach the client as each event is written. The fastest levels:
 * on a 750 KB pull page gzip level 1 took a third of the default level's time for 6 % more bytes,
 * and brotli quality 1 was faster still and smaller than gzip's default (measured for bench:sync).
 * Larger chunks than zlib's 16 KB default mean fewer hops between the thread pool and the event loop.
 */
export function compressApi(): RequestHandler {
  return compression({
    level: constants.Z_BEST_SPEED,
    brotli: { params: { [constants.BROTLI_PARAM_QUALITY]: 1 } },
    chunkSize: 64 * 1024,
    filter: (req, res) => !String(res.getHeader('Content-Type') ?? '').startsWith('text/event-stream') && compression.filter(req, res),
  });
}
