import type { ChildProcess } from 'node:child_process';
import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { createServer } from 'node:net';

/**
 * Stops with a clear message when a Debian package's program is missing. `npm test` and
 * `npm run start:cluster` install nginx and pgbouncer first when run as root (scripts/lib.mjs).
 */
export function requireProgram(program: string, debianPackage: string): void {
  if (existsSync(program)) return;
  throw new Error(
    `${program} is missing. Install Debian's ${debianPackage} (apt-get install -y ${debianPackage}); npm test and npm run start:cluster do it when run as root.`,
  );
}

/** A loopback port nobody listens on right now (the kernel's pick). */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      server.close(() => resolve(port));
    });
  });
}

/** Waits until `url` answers 200, or throws after `timeoutMs`. */
export async function waitForOk(url: string, timeoutMs = 20_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    try {
      const res = await fetch(url);
      if (res.ok) return;
    } catch {
      // not listening yet
    }
    if (Date.now() > deadline) throw new Error(`${url} did not answer 200 within ${timeoutMs} ms`);
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
}

/** Stops a child with SIGTERM, then SIGKILL if it has not gone after `graceMs`. */
export function stopChild(child: ChildProcess, graceMs = 5000): Promise<void> {
  if (child.exitCode !== null || child.signalCode !== null) return Promise.resolve();
  return new Promise((resolve) => {
    const timer = setTimeout(() => child.kill('SIGKILL'), graceMs);
    child.once('exit', () => {
      clearTimeout(timer);
      resolve();
    });
    child.kill('SIGTERM');
  });
}

/** A file of deploy/ with its `{{NAME}}` placeholders filled in; a placeholder without a value is an error. */
export function fillTemplate(name: string, values: Record<string, string>): string {
  const file = path.resolve(__dirname, '../../../../deploy', name);
  return readFileSync(file, 'utf8').replace(/\{\{([A-Z_]+)\}\}/g, (_, key: string) => {
    const value = values[key];
    if (value === undefined) throw new Error(`deploy/${name}: no value for {{${key}}}`);
    return value;
  });
}
