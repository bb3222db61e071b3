import { createHash } from 'node:crypto';

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
