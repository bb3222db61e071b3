import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';

import { startNginx, type RunningNginx } from './nginx';
import { startPgBouncer, type RunningPgBouncer } from './pgbouncer';
import { freePort, stopChild } from './processes';

const MAIN = path.resolve(__dirname, '../../sync-server/src/main.js');
const DEFAULT_UPLOAD_MAX_BYTES = 2 * 1024 * 1024;
/** Log lines kept per instance for specs to read (at least this many, at most twice). */
const KEPT_LINES = 5000;

export interface Instance {
  readonly name: string;
  readonly port: number;
  readonly child: ChildProcess;
  /** The instance's last log lines (JSON), newest last. */
  readonly lines: string[];
}

export interface ClusterOptions {
  /** Server environment (DATABASE_URL, LAMPLIGHT_JWT_SECRET, SMTP_URL, …). */
  readonly env: Record<string, string | undefined>;
  readonly instances?: number;
  /** Where nginx listens; a free loopback port when absent. */
  readonly listen?: string;
  /** The instances' ports; free ports when absent. */
  readonly instancePorts?: readonly number[];
  /** Put PgBouncer (transaction pooling) between the instances and PostgreSQL, on this port (0: any free one). */
  readonly pgBouncerPort?: number;
  /** Copy the instances' log lines to this process's stdout. */
  readonly echo?: boolean;
  /** Folder for nginx's files; a fresh temporary one when absent. */
  readonly prefix?: string;
}

export interface RunningCluster {
  readonly baseUrl: string;
  readonly instances: Instance[];
  readonly nginx: RunningNginx;
  readonly pgBouncer: RunningPgBouncer | null;
  stop(): Promise<void>;
}

/**
 * Lamplight as an operator runs it: N server processes (3 by default) started together on one
 * PostgreSQL (through PgBouncer if asked), each trusting X-Forwarded-For from the proxy only,
 * and nginx in front (deploy/nginx.conf).
 */
export async function startCluster(options: ClusterOptions): Promise<RunningCluster> {
  const count = options.instances ?? 3;
  const started: { stop(): Promise<void> }[] = [];
  try {
    let databaseUrl = options.env['DATABASE_URL'];
    if (!databaseUrl) throw new Error('DATABASE_URL is required');
    let pgBouncer: RunningPgBouncer | null = null;
    if (options.pgBouncerPort !== undefined) {
      pgBouncer = await startPgBouncer(databaseUrl, options.pgBouncerPort || (await freePort()));
      started.push(pgBouncer);
      databaseUrl = pgBouncer.databaseUrl;
    }
    const env: Record<string, string | undefined> = {
      ...options.env,
      DATABASE_URL: databaseUrl,
      LAMPLIGHT_TRUST_PROXY: '127.0.0.1',
      ...(pgBouncer ? { LAMPLIGHT_DB_TRANSACTION_POOLING: 'true' } : {}),
    };
    const ports = options.instancePorts ?? Array.from({ length: count }, () => 0);
    const starts = await Promise.allSettled(ports.map((port, index) => startInstance(`instance-${index + 1}`, port, env, options.echo ?? false)));
    const instances = starts.flatMap((start) => (start.status === 'fulfilled' ? [start.value] : []));
    started.push(...instances.map((instance) => ({ stop: () => stopChild(instance.child) })));
    const failed = starts.find((start) => start.status === 'rejected');
    if (failed) throw failed.reason;

    const prefix = options.prefix ?? mkdtempSync(path.join(tmpdir(), 'lamplight-nginx-'));
    // A temporary prefix is removed when the cluster stops, right after nginx (stops run in reverse).
    if (!options.prefix) started.push({ stop: async () => rmSync(prefix, { recursive: true, force: true }) });
    const nginx = await startNginx({
      prefix,
      listen: options.listen ?? `127.0.0.1:${await freePort()}`,
      upstreams: instances.map((instance) => `127.0.0.1:${instance.port}`),
      uploadMaxBytes: Number(env['LAMPLIGHT_UPLOAD_MAX_BYTES'] ?? DEFAULT_UPLOAD_MAX_BYTES),
    });
    started.push(nginx);
    return {
      baseUrl: nginx.baseUrl,
      instances,
      nginx,
      pgBouncer,
      stop: () => stopAll(started),
    };
  } catch (error) {
    await stopAll(started);
    throw error;
  }
}

/** Stops in reverse order of starting: the proxy first, PostgreSQL's pooler last. */
async function stopAll(started: { stop(): Promise<void> }[]): Promise<void> {
  for (const part of started.reverse()) await part.stop().catch(() => undefined);
}

/** Starts one server process and resolves once it says where it listens. */
export function startInstance(
  name: string,
  port: number,
  env: Record<string, string | undefined>,
  echo: boolean,
  nodeArgs: readonly string[] = [],
): Promise<Instance> {
  return new Promise((resolve, reject) => {
    // `LAMPLIGHT_BENCH_SERVER_MAIN` runs another build instead (benchmarks' before/after comparisons).
    const main = env['LAMPLIGHT_BENCH_SERVER_MAIN'] ?? process.env['LAMPLIGHT_BENCH_SERVER_MAIN'] ?? MAIN;
    const child = spawn(process.execPath, [...nodeArgs, main], { env: { ...process.env, ...env, PORT: String(port) }, stdio: ['ignore', 'pipe', 'inherit'] });
    const lines: string[] = [];
    let partial = '';
    let listening = false;
    const timer = setTimeout(() => {
      child.kill('SIGKILL');
      reject(new Error(`${name} did not start within 60 s`));
    }, 60_000);
    child.stdout!.on('data', (chunk: Buffer) => {
      if (echo) process.stdout.write(chunk);
      const text = partial + chunk.toString();
      const complete = text.split('\n');
      partial = complete.pop() ?? '';
      lines.push(...complete);
      if (lines.length > 2 * KEPT_LINES) lines.splice(0, lines.length - KEPT_LINES);
      if (listening) return;
      for (const line of complete) {
        const match = /running at http:\/\/[^:]+:(\d+)\//.exec(line);
        if (match) {
          listening = true;
          clearTimeout(timer);
          resolve({ name, port: Number(match[1]), child, lines });
        }
      }
    });
    child.once('exit', (code, signal) => {
      clearTimeout(timer);
      reject(new Error(`${name} exited (${code ?? signal}) before it listened: ${[...lines, partial].slice(-6).join(' | ')}`));
    });
  });
}
