import { createHash } from 'node:crypto';
import { isIPv4, isIPv6 } from 'node:net';

import pino, { type DestinationStream, type Logger } from 'pino';

export type LogLevel = 'fatal' | 'error' | 'warn' | 'info' | 'debug' | 'trace' | 'silent';
export const LOG_LEVELS: readonly LogLevel[] = ['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent'];

/**
 * Paths pino blanks out wherever they appear. The request logger never logs headers or bodies in
 * the first place; this catches a careless `log.info({ body })` elsewhere.
 */
const REDACTED = [
  'password',
  'newPassword',
  'currentPassword',
  'token',
  'accessToken',
  'refreshToken',
  'authorization',
  'cookie',
  '*.password',
  '*.newPassword',
  '*.currentPassword',
  '*.token',
  '*.accessToken',
  '*.refreshToken',
  '*.authorization',
  '*.cookie',
  '*.headers',
  '*.body',
  '*.text',
  '*.html',
  '*.changes',
];

/** One JSON object per line on stdout (pino's format), at `level`; specs pass their own destination. */
export function createLogger(level: LogLevel, destination?: DestinationStream): Logger {
  return pino(
    {
      level,
      base: { service: 'lamplight-sync-server', pid: process.pid },
      timestamp: pino.stdTimeFunctions.isoTime,
      redact: { paths: REDACTED, censor: '[redacted]' },
    },
    destination,
  );
}

/**
 * A short, stable pseudonym of a user id for logs: enough to follow one reader's requests across
 * instances, without writing their id (which other tables join on) into log files.
 */
export function userIdHash(userId: string): string {
  return createHash('sha256').update(`lamplight-log:${userId}`).digest('hex').slice(0, 16);
}

/**
 * A client address cut to its network (IPv4 /24, IPv6 /48), as privacy-minded analytics do: enough
 * to see where traffic comes from and to tell a proxy from a client, not to single out a reader.
 */
export function addressNetwork(address: string | undefined): string | undefined {
  if (!address) return undefined;
  const plain = address.startsWith('::ffff:') ? address.slice(7) : address;
  if (isIPv4(plain)) return `${plain.split('.').slice(0, 3).join('.')}.0/24`;
  if (isIPv6(plain)) {
    const [head = ''] = plain.split('::');
    const groups = head.split(':').filter((group) => group !== '');
    return `${[...groups.slice(0, 3), ...Array(Math.max(0, 3 - groups.length)).fill('0')].join(':')}::/48`;
  }
  return undefined;
}
