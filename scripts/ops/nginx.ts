import { spawn, type ChildProcess } from 'node:child_process';
import { mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';

import { fillTemplate, requireProgram, stopChild, waitForOk } from './processes';

export const NGINX = '/usr/sbin/nginx';

/** Room for the multipart envelope around an upload at its size limit. */
const MULTIPART_SLACK_BYTES = 64 * 1024;

export interface NginxOptions {
  /** Where nginx keeps its config, pid, logs and temp files. */
  readonly prefix: string;
  /** `127.0.0.1:8080`. */
  readonly listen: string;
  /** `127.0.0.1:8081`, … */
  readonly upstreams: readonly string[];
  /** The server's LAMPLIGHT_UPLOAD_MAX_BYTES. */
  readonly uploadMaxBytes: number;
}

/** deploy/nginx.conf with its placeholders filled in. */
export function renderNginxConfig(options: NginxOptions): string {
  const servers = options.upstreams.map((address) => `    server ${address} max_fails=3 fail_timeout=10s;`).join('\n');
  const values: Record<string, string> = {
    PREFIX: options.prefix,
    LISTEN: options.listen,
    UPSTREAM_SERVERS: servers,
    BODY_LIMIT: String(options.uploadMaxBytes + MULTIPART_SLACK_BYTES),
  };
  return fillTemplate('nginx.conf', values);
}

export interface RunningNginx {
  readonly child: ChildProcess;
  readonly baseUrl: string;
  stop(): Promise<void>;
}

/** Writes the config, checks it with `nginx -t`, runs nginx in the foreground, waits for it to proxy. */
export async function startNginx(options: NginxOptions, readyPath = '/api/health'): Promise<RunningNginx> {
  requireProgram(NGINX, 'nginx');
  mkdirSync(path.join(options.prefix, 'temp'), { recursive: true });
  const configFile = path.join(options.prefix, 'nginx.conf');
  writeFileSync(configFile, renderNginxConfig(options));
  const args = ['-p', options.prefix, '-c', configFile, '-e', path.join(options.prefix, 'error.log')];
  const check = spawn(NGINX, [...args, '-t', '-q'], { stdio: ['ignore', 'inherit', 'inherit'] });
  const checked = await new Promise<number | null>((resolve) => check.once('exit', resolve));
  if (checked !== 0) throw new Error(`nginx -t refused ${configFile}`);

  const child = spawn(NGINX, args, { stdio: ['ignore', 'inherit', 'inherit'] });
  const baseUrl = `http://${options.listen}`;
  const exited = new Promise<never>((_, reject) => child.once('exit', (code) => reject(new Error(`nginx exited with ${code}; see ${options.prefix}/error.log`))));
  await Promise.race([waitForOk(`${baseUrl}${readyPath}`), exited]);
  exited.catch(() => undefined);
  return { child, baseUrl, stop: () => stopChild(child) };
}
