import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { existsSync } from 'node:fs';
import { createServer } from 'node:net';

/**
 * Makes sure a Debian package's program is there: installs it with apt-get when we are root,
 * otherwise stops with the command to run. (npm test and start:cluster need nginx and pgbouncer.)
 */
export function ensureDebianProgram(program: string, debianPackage: string): void {
  if (existsSync(program)) return;
  if (process.getuid?.() !== 0) {
    throw new Error(`${program} is missing. Install Debian's ${debianPackage}: sudo apt-get install -y ${debianPackage}`);
  }
  console.log(`Installing Debian's ${debianPackage} (apt-get)…`);
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  for (const args of [['update', '-qq'], ['install', '-y', '-qq', debianPackage]]) {
    const result = spawnSync('apt-get', args, { stdio: 'inherit', env });
    if (result.status !== 0) throw new Error(`apt-get ${args.join(' ')} failed (exit ${result.status})`);
  }
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

export { spawn };
