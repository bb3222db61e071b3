import type { RequestHandler } from 'express';

/**
 * `/robots.txt`: everything behind sign-in is private, so crawlers may see the start page and
 * nothing of the API (RFC 9309).
 */
const ROBOTS = 'User-agent: *\nDisallow: /api/\nAllow: /\n';

export const robotsTxt: RequestHandler = (_req, res) => {
  res.setHeader('Cache-Control', 'public, max-age=86400');
  res.type('text/plain').send(ROBOTS);
};
