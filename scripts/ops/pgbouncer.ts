import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { chownSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { createConnection } from 'node:net';
import { tmpdir } from 'node:os';
import path from 'node:path';

import { fillTemplate, requireProgram, stopChild } from './processes';

export const PGBOUNCER = '/usr/sbin/pgbouncer';
/** PgBouncer will not run as root; it switches to the user that owns the PostgreSQL cluster. */
const RUN_AS_WHEN_ROOT = 'postgres';

export interface RunningPgBouncer {
  readonly child: ChildProcess;
  /** DATABASE_URL for the server, through PgBouncer. */
  readonly databaseUrl: string;
  readonly dir: string;
  stop(): Promise<void>;
}

/**
 * Runs PgBouncer (transaction pooling) in front of the PostgreSQL of `directUrl`, on `port`,
 * with its files in a fresh folder: deploy/pgbouncer.ini filled in, and a user list holding the
 * URL's user and password (PgBouncer logs in to PostgreSQL with them over SCRAM).
 */
export async function startPgBouncer(directUrl: string, port: number, poolSize = 20): Promise<RunningPgBouncer> {
  requireProgram(PGBOUNCER, 'pgbouncer');
  const target = new URL(directUrl);
  const user = decodeURIComponent(target.username);
  const password = decodeURIComponent(target.password);
  const dir = mkdtempSync(path.join(tmpdir(), 'lamplight-pgbouncer-'));
  const values: Record<string, string> = {
    PG_HOST: target.hostname,
    PG_PORT: target.port || '5432',
    LISTEN_PORT: String(port),
    POOL_SIZE: String(poolSize),
    DIR: dir,
  };
  writeFileSync(path.join(dir, 'pgbouncer.ini'), fillTemplate('pgbouncer.ini', values));
  const quote = (text: string) => `"${text.replace(/"/g, '""')}"`;
  writeFileSync(path.join(dir, 'userlist.txt'), `${quote(user)} ${quote(password)}\n`, { mode: 0o600 });

  const args = [path.join(dir, 'pgbouncer.ini')];
  if (process.getuid?.() === 0) {
    const owner = spawnSync('id', ['-u', RUN_AS_WHEN_ROOT], { encoding: 'utf8' });
    const group = spawnSync('id', ['-g', RUN_AS_WHEN_ROOT], { encoding: 'utf8' });
    for (const file of [dir, path.join(dir, 'pgbouncer.ini'), path.join(dir, 'userlist.txt')]) {
      chownSync(file, Number(owner.stdout), Number(group.stdout));
    }
    args.unshift('-u', RUN_AS_WHEN_ROOT);
  }
  // It writes the same lines to its logfile; the terminal stays for the servers' logs.
  const child = spawn(PGBOUNCER, args, { stdio: 'ignore' });
  await waitForPort(port, child, dir);

  const databaseUrl = new URL(directUrl);
  databaseUrl.port = String(port);
  const stop = async () => {
    await stopChild(child);
    rmSync(dir, { recursive: true, force: true });
  };
  return { child, databaseUrl: databaseUrl.toString(), dir, stop };
}

async function waitForPort(port: number, child: ChildProcess, dir: string): Promise<void> {
  const deadline = Date.now() + 10_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`pgbouncer exited with ${child.exitCode}; see ${dir}/pgbouncer.log`);
    const open = await new Promise<boolean>((resolve) => {
      const socket = createConnection(port, '127.0.0.1');
      socket.once('connect', () => {
        socket.destroy();
        resolve(true);
      });
      socket.once('error', () => resolve(false));
    });
    if (open) return;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  throw new Error(`pgbouncer did not listen on ${port}; see ${dir}/pgbouncer.log`);
}
