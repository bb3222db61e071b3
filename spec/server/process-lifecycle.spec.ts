import { spawn, type ChildProcess } from 'node:child_process';
import { connect, type Socket } from 'node:net';
import path from 'node:path';

import { testDatabaseUrl } from '../support/test-database';
import { testInbox } from '../support/test-server';

/** The compiled server entry point, run as a real process (dist/node/spec/server → dist/node/sync-server). */
const MAIN = path.resolve(__dirname, '../../sync-server/src/main.js');
const LIFECYCLE = path.resolve(__dirname, '../../sync-server/src/process-lifecycle.js');

interface ServerProcess {
  readonly child: ChildProcess;
  readonly port: number;
  output(): string;
  exited: Promise<number | null>;
}

async function startServerProcess(): Promise<ServerProcess> {
  const { port: smtpPort } = await testInbox();
  const child = spawn(process.execPath, [MAIN], {
    env: {
      PATH: process.env['PATH'],
      HOST: '127.0.0.1',
      PORT: '0',
      DATABASE_URL: testDatabaseUrl(),
      LAMPLIGHT_JWT_SECRET: 'spec-secret-that-is-at-least-32-characters-long',
      LAMPLIGHT_BCRYPT_COST: '4',
      LAMPLIGHT_AUTH_RATE_LIMIT: '100000',
      SMTP_URL: `smtp://127.0.0.1:${smtpPort}`,
      NODE_ENV: 'test',
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let output = '';
  child.stdout!.on('data', (chunk: Buffer) => (output += chunk.toString()));
  child.stderr!.on('data', (chunk: Buffer) => (output += chunk.toString()));
  const exited = new Promise<number | null>((resolve) => child.on('exit', (code) => resolve(code)));
  const port = await waitFor(
    () => /running at http:\/\/127\.0\.0\.1:(\d+)\//.exec(output)?.[1],
    () => output,
  );
  return { child, port: Number(port), output: () => output, exited };
}

async function waitFor<T>(probe: () => T | undefined, describeState: () => string, timeoutMs = 15_000): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const value = probe();
    if (value !== undefined) return value;
    if (Date.now() > deadline) throw new Error(`timed out; output so far:\n${describeState()}`);
    await new Promise((resolve) => setTimeout(resolve, 25));
  }
}

function openSocket(port: number): Promise<Socket> {
  return new Promise((resolve, reject) => {
    const socket = connect(port, '127.0.0.1', () => resolve(socket));
    socket.on('error', reject);
  });
}

describe('The server process', () => {
  describe('When it gets SIGTERM while a request is in flight', () => {
    it('then it stops accepting connections, still answers that request, closes the pool and exits 0', async () => {
      const server = await startServerProcess();
      const body = JSON.stringify({ email: `nobody-${Date.now()}@example.invalid`, password: 'not-the-password-1' });
      const socket = await openSocket(server.port);
      let response = '';
      socket.on('data', (chunk: Buffer) => (response += chunk.toString()));
      // Headers and half of the body: the server has begun this request and waits for the rest.
      socket.write(
        `POST /api/auth/login HTTP/1.1\r\nHost: 127.0.0.1\r\nContent-Type: application/json\r\nContent-Length: ${Buffer.byteLength(body)}\r\n\r\n` +
          body.slice(0, 10),
      );
      await new Promise((resolve) => setTimeout(resolve, 200));

      server.child.kill('SIGTERM');
      await waitFor(() => (server.output().includes('SIGTERM: stopping') ? true : undefined), server.output);

      const refused = await openSocket(server.port).then(
        (late) => (late.destroy(), 'accepted'),
        (err: NodeJS.ErrnoException) => err.code,
      );
      expect(refused).toBe('ECONNREFUSED');

      socket.write(body.slice(10));
      await waitFor(
        () => (/\r\n\r\n\{.*\}$/s.test(response) ? true : undefined),
        () => response,
      );
      // A wrong e-mail or password is a 401: the request ran to its normal end, not cut off.
      expect(response).toMatch(/^HTTP\/1\.1 401 /);

      expect(await server.exited).toBe(0);
      expect(server.output()).toContain('Lamplight stopped.');
      socket.destroy();
    });
  });

  describe('When a promise rejection goes unhandled', () => {
    it('then the handler logs it and exits with code 1, for the supervisor to restart', async () => {
      const script = `require(${JSON.stringify(LIFECYCLE)}).exitOnUnexpectedError();
        Promise.reject(new Error('nobody caught this'));
        setTimeout(() => console.log('still running'), 2000);`;
      const child = spawn(process.execPath, ['-e', script], { stdio: ['ignore', 'pipe', 'pipe'] });
      let output = '';
      child.stdout!.on('data', (chunk: Buffer) => (output += chunk.toString()));
      child.stderr!.on('data', (chunk: Buffer) => (output += chunk.toString()));
      const code = await new Promise<number | null>((resolve) => child.on('exit', resolve));
      expect(code).toBe(1);
      expect(output).toContain('nobody caught this');
      expect(output).not.toContain('still running');
    });
  });
});
