import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';

import request from 'supertest';

import { bearer, registerReader } from '../support/accounts';
import { createTestApp } from '../support/test-server';

describe('Serving the built app', () => {
  let appDir: string;

  beforeAll(() => {
    appDir = mkdtempSync(path.join(tmpdir(), 'lamplight-app-'));
    writeFileSync(path.join(appDir, 'index.html'), '<!doctype html><title>Lamplight</title>');
    writeFileSync(path.join(appDir, 'main-ABCDEFGH.js'), 'console.log(1)');
    writeFileSync(path.join(appDir, 'chunk--_81Vfg9.js'), 'console.log(2)');
    writeFileSync(path.join(appDir, 'ngsw-worker.js'), 'console.log(3)');
  });

  it('When a client route is asked for, then index.html answers so the client router can take it', async () => {
    const app = await createTestApp({ LAMPLIGHT_APP_DIR: appDir });

    const res = await request(app).get('/library/some-book').expect(200);

    expect(res.text).toContain('<title>Lamplight</title>');
    expect(res.headers['cache-control']).toBe('no-cache');
  });

  it('When a hashed bundle is asked for, then it may be cached for a year', async () => {
    const app = await createTestApp({ LAMPLIGHT_APP_DIR: appDir });

    const res = await request(app).get('/main-ABCDEFGH.js').expect(200);

    expect(res.headers['cache-control']).toContain('immutable');
    // A chunk named by the build's chunk optimiser (Rollup's base64url hash: letters of both cases, - and _).
    expect((await request(app).get('/chunk--_81Vfg9.js').expect(200)).headers['cache-control']).toContain('immutable');
    // Unhashed files keep one name across versions: the browser asks again.
    expect((await request(app).get('/ngsw-worker.js').expect(200)).headers['cache-control']).toBe('no-cache');
  });

  it('When an unknown API route is asked for, then the fallback does not hide the JSON 404', async () => {
    const app = await createTestApp({ LAMPLIGHT_APP_DIR: appDir });
    const { accessToken } = await registerReader(app);

    const res = await request(app).get('/api/unknown').set(bearer(accessToken)).expect(404);

    expect(res.body.error.code).toBe('not_found');
  });

  it('When a missing file with an extension is asked for, then it is a 404, not the app page', async () => {
    const app = await createTestApp({ LAMPLIGHT_APP_DIR: appDir });

    const res = await request(app).get('/favicon-missing.png').expect(404);

    expect(res.text).not.toContain('<title>Lamplight</title>');
    expect((await request(app).get('/assets/old-bundle-ZZZZZZZZ.js').expect(404)).text).toBe('Not found');
    // Client routes (no extension) still get the app.
    expect((await request(app).get('/goals/2026').expect(200)).text).toContain('<title>Lamplight</title>');
  });
});
