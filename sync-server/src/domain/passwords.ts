import { createHash } from 'node:crypto';
import path from 'node:path';

import { Piscina } from 'piscina';

import type { ServerConfig } from '../config';
import { AppError } from '../errors';
import type { PasswordJob } from './password-worker';

/** bcrypt cost: OWASP Password Storage Cheat Sheet asks for at least 10. Specs lower it. */
export const DEFAULT_BCRYPT_COST = 10;

/** Seconds a client is asked to wait when every password thread and queue place is taken. */
export const BUSY_RETRY_SECONDS = 2;

/** Worker threads hashing at once (capped concurrency) and jobs allowed to wait; beyond that, 503. */
export type HashPoolSize = Pick<ServerConfig, 'hashThreads' | 'hashQueue'>;

const DEFAULT_POOL: HashPoolSize = { hashThreads: 1, hashQueue: 32 };

/** One pool per size, shared by every app in the process (specs build many apps). */
const pools = new Map<string, Piscina<PasswordJob, string | boolean>>();

function poolOf(size: HashPoolSize): Piscina<PasswordJob, string | boolean> {
  const key = `${size.hashThreads}:${size.hashQueue}`;
  let pool = pools.get(key);
  if (!pool) {
    pool = new Piscina<PasswordJob, string | boolean>({
      filename: path.join(__dirname, 'password-worker.js'),
      minThreads: 1,
      maxThreads: size.hashThreads,
      maxQueue: size.hashQueue,
      // Idle threads are unref'd by piscina, so they never hold the process open.
      idleTimeout: 30_000,
    });
    pools.set(key, pool);
  }
  return pool;
}

/** Stops every password thread (server shutdown, end of a spec run). */
export async function closePasswordPools(): Promise<void> {
  const all = [...pools.values()];
  pools.clear();
  await Promise.all(all.map((pool) => pool.destroy()));
}

async function run(job: PasswordJob, size: HashPoolSize): Promise<string | boolean> {
  try {
    return await poolOf(size).run(job);
  } catch (err) {
    if (err instanceof Error && err.message === 'Task queue is at limit') {
      throw new AppError(503, 'busy', 'The server is busy checking passwords; try again in a moment', undefined, {
        'Retry-After': String(BUSY_RETRY_SECONDS),
      });
    }
    throw err;
  }
}

/**
 * bcrypt reads only the first 72 bytes of its input, so two long passphrases sharing a prefix
 * would hash alike. We feed it base64(SHA-256(password)) instead: 44 ASCII bytes that depend on
 * every byte of the password, of any length.
 */
function preDigest(password: string): string {
  return createHash('sha256').update(password.normalize('NFC'), 'utf8').digest('base64');
}

export async function hashPassword(password: string, cost = DEFAULT_BCRYPT_COST, size = DEFAULT_POOL): Promise<string> {
  return (await run({ op: 'hash', digest: preDigest(password), cost }, size)) as string;
}

export async function verifyPassword(password: string, hash: string, size = DEFAULT_POOL): Promise<boolean> {
  return (await run({ op: 'compare', digest: preDigest(password), hash }, size)) as boolean;
}
