import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';

/** The compiled server entry point, as `npm start` runs it. */
const MAIN = path.resolve(__dirname, '../../sync-server/src/main.js');

/** A real server process on loopback. */
export interface ServerProcess {
  readonly baseUrl: string;
  readonly port: number;
  readonly child: ChildProcess;
  /** Resolves when the process has exited. */
  readonly exited: Promise<void>;
}

/** What a server process needs besides the database: a secret, a low bcrypt cost, a generous attempt limit. */
export function serverProcessEnv(databaseUrl: string, smtpPort: number, extra: Record<string, string> = {}): Record<string, string> {
  return {
    DATABASE_URL: databaseUrl,
    LAMPLIGHT_JWT_SECRET: 'bench-secret-that-is-at-least-32-characters-long',
    LAMPLIGHT_BCRYPT_COST: '4',
    LAMPLIGHT_AUTH_RATE_LIMIT: '100000',
    SMTP_URL: `smtp://127.0.0.1:${smtpPort}`,
    NODE_ENV: 'test',
    ...extra,
  };
}

/** Starts `node dist/node/sync-server/src/main.js` on `port` (0: any free one); resolves once it listens. */
export function startServerProcess(env: Record<string, string>, port = 0): Promise<ServerProcess> {
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, [MAIN], { env: { ...process.env, ...env, HOST: '127.0.0.1', PORT: String(port) }, stdio: ['ignore', 'pipe', 'pipe'] });
    const exited = new Promise<void>((done) => child.once('exit', () => done()));
    let errors = '';
    child.stderr!.on('data', (chunk: Buffer) => (errors = (errors + chunk.toString()).slice(-2000)));
    const timer = setTimeout(() => reject(new Error(`server process did not start: ${errors}`)), 30_000);
    child.stdout!.on('data', (chunk: Buffer) => {
      const match = /running at (http:\/\/127\.0\.0\.1:(\d+))\//.exec(chunk.toString());
      if (match) {
        clearTimeout(timer);
        resolve({ baseUrl: match[1]!, port: Number(match[2]), child, exited });
      }
    });
    child.once('exit', (code, signal) => {
      clearTimeout(timer);
      reject(new Error(`server process exited with ${code ?? signal}: ${errors}`));
    });
  });
}

/** Resident memory (kB) and CPU time used so far (ms) of a process, from /proc (Linux). */
export async function processUsage(pid: number): Promise<{ rssKb: number; cpuMs: number }> {
  const { readFile } = await import('node:fs/promises');
  const status = await readFile(`/proc/${pid}/status`, 'utf8');
  const stat = (await readFile(`/proc/${pid}/stat`, 'utf8')).split(') ')[1]!.split(' ');
  // Fields 14 and 15 of proc(5) (utime, stime), counted after the ") " that ends the command name.
  const ticks = Number(stat[11]) + Number(stat[12]);
  return { rssKb: Number(/VmRSS:\s+(\d+)/.exec(status)?.[1] ?? 0), cpuMs: (ticks * 1000) / 100 };
}

/** Registers a reader through the API and signs them in; resolves with the access token. */
export async function registeredReader(baseUrl: string, email: string, password = 'amber lanterns over the quiet quay'): Promise<string> {
  const res = await fetch(`${baseUrl}/api/auth/register`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email, password, displayName: 'Maren Vospel' }),
  });
  if (res.status !== 201) throw new Error(`register answered ${res.status}: ${await res.text()}`);
  return ((await res.json()) as { accessToken: string }).accessToken;
}
