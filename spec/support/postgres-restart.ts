import { execFile } from 'node:child_process';
import path from 'node:path';
import { promisify } from 'node:util';

const run = promisify(execFile);
/** The repository root, from dist/node/spec/support. */
const ROOT = path.resolve(__dirname, '../../../..');

/**
 * Stops and starts the project-local PostgreSQL cluster that `databaseUrl` points at (through
 * scripts/db.sh, on that URL's port), without blocking the event loop, so clients keep running
 * and meet the outage. Refuses a URL that is not on 127.0.0.1 (never someone else's server).
 */
export async function restartLocalPostgres(databaseUrl: string): Promise<void> {
  const url = new URL(databaseUrl);
  if (url.hostname !== '127.0.0.1' && url.hostname !== 'localhost') throw new Error(`not restarting a database on ${url.hostname}`);
  const env = { ...process.env, LAMPLIGHT_PG_PORT: url.port || '5432' };
  await run('bash', ['scripts/db.sh', 'stop'], { cwd: ROOT, env });
  await run('bash', ['scripts/db.sh', 'start'], { cwd: ROOT, env });
}
