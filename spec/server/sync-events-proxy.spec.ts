import { spawn, type ChildProcess } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import { existsSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';

import { registerReader } from '../support/accounts';
import { fieldChange, SyncClient } from '../support/sync-client';
import { SyncEventStream } from '../support/sync-event-stream';
import { startTestServer, type RunningServer } from '../support/test-server';

const NGINX = '/usr/sbin/nginx';
/** This spec's own loopback port range (nginx cannot listen on port 0). */
const PORTS = { from: 41150, to: 41199 };

/**
 * nginx with its defaults for proxying (response buffering on, gzip off; the stream also sends
 * `X-Accel-Buffering: no`, which turns buffering off for it: nginx docs, ngx_http_proxy_module,
 * "proxy_buffering"). Turning gzip on for text/event-stream compresses the stream (nginx's gzip
 * ignores `Cache-Control: no-transform`): the content-encoding check below catches that.
 */
function nginxConfig(dir: string, listenPort: number, upstreamPort: number): string {
  return `
daemon off;
worker_processes 1;
pid ${dir}/nginx.pid;
error_log ${dir}/error.log warn;
events { worker_connections 64; }
http {
  access_log off;
  client_body_temp_path ${dir}/body;
  proxy_temp_path ${dir}/proxy;
  fastcgi_temp_path ${dir}/fastcgi;
  uwsgi_temp_path ${dir}/uwsgi;
  scgi_temp_path ${dir}/scgi;
  server {
    listen 127.0.0.1:${listenPort};
    location / {
      proxy_pass http://127.0.0.1:${upstreamPort};
      proxy_http_version 1.1;
      proxy_set_header Connection "";
    }
  }
}`;
}

async function startNginx(upstreamPort: number): Promise<{ baseUrl: string; child: ChildProcess }> {
  const dir = mkdtempSync(path.join(tmpdir(), 'lamplight-nginx-'));
  for (let attempt = 0; attempt < 10; attempt++) {
    const port = PORTS.from + Math.floor(Math.random() * (PORTS.to - PORTS.from + 1));
    writeFileSync(path.join(dir, 'nginx.conf'), nginxConfig(dir, port, upstreamPort));
    const child = spawn(NGINX, ['-p', dir, '-c', path.join(dir, 'nginx.conf')], { stdio: 'ignore' });
    const baseUrl = `http://127.0.0.1:${port}`;
    for (let wait = 0; wait < 50; wait++) {
      if (child.exitCode !== null) break; // the port was taken: try another
      const up = await fetch(`${baseUrl}/api/health`).then(
        () => true,
        () => false,
      );
      if (up) return { baseUrl, child };
      await new Promise((resolve) => setTimeout(resolve, 100));
    }
    child.kill('SIGTERM');
  }
  throw new Error('nginx did not start');
}

describe('Live sync events behind nginx (a reverse proxy with default buffering)', () => {
  let server: RunningServer;
  let nginx: { baseUrl: string; child: ChildProcess } | undefined;

  beforeAll(async () => {
    server = await startTestServer();
    if (existsSync(NGINX)) nginx = await startNginx(Number(new URL(server.baseUrl).port));
  });
  afterAll(async () => {
    nginx?.child.kill('SIGTERM');
    await server.close();
  });

  it('When a device pushes, then a stream read through nginx is poked within a second', async () => {
    if (!nginx) return pending('Debian nginx is not installed');
    const reader = await registerReader(server.app);
    const stream = await SyncEventStream.open(nginx.baseUrl, reader.accessToken);
    try {
      expect(stream.status).toBe(200);
      await stream.nextSync(0);
      const seen = stream.events.length;
      const pushedAt = performance.now();
      await new SyncClient(server.baseUrl, reader.accessToken).push([fieldChange(randomUUID(), 'title', 'Through the Gate', { wall: Date.now() })]);
      const poke = await stream.nextSync(seen, 3000);
      expect(poke.at - pushedAt).toBeLessThan(1000);
      expect(stream.headers.get('content-encoding')).toBeNull();
    } finally {
      stream.close();
    }
  });
});
