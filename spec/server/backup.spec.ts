import { execFileSync } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';

import request from 'supertest';
import type { DataSource } from 'typeorm';

import { createApp } from '../../sync-server/src/app';
import { createDataSource } from '../../sync-server/src/data-access/data-source';
import { migrate } from '../../sync-server/src/data-access/migrate';
import { createSmtpMailer } from '../../sync-server/src/mail/mailer';
import { bearer, registerReader } from '../support/accounts';
import { uniquePng } from '../support/images';
import { fieldChange } from '../support/sync-client';
import { testConfig } from '../support/test-server';

const ROOT = path.resolve(__dirname, '../../../..');
const BACKUP_DB = 'lamplight_backup';

/** Per table: its row count and an md5 over its rows in a fixed order (PostgreSQL's own md5). */
async function fingerprint(dataSource: DataSource): Promise<Record<string, string>> {
  const tables: { name: string }[] = await dataSource.query(`SELECT tablename AS name FROM pg_tables WHERE schemaname = 'public' ORDER BY 1`);
  const result: Record<string, string> = {};
  for (const { name } of tables) {
    const [row] = await dataSource.query(`SELECT count(*) AS n, md5(coalesce(string_agg(t::text, E'\\n' ORDER BY t::text), '')) AS sum FROM "${name}" t`);
    result[name] = `${row.n} rows, md5 ${row.sum}`;
  }
  const [seq] = await dataSource.query(`SELECT last_value FROM pg_sequences WHERE schemaname = 'public' ORDER BY sequencename LIMIT 1`);
  result['(first sequence)'] = String(seq?.last_value);
  return result;
}

const sh = (script: string, args: string[], env: Record<string, string> = {}) =>
  execFileSync('bash', [script, ...args], { cwd: ROOT, encoding: 'utf8', env: { ...process.env, ...env } });

describe('scripts/backup.sh and scripts/restore.sh', () => {
  it('When a database with readers, books and covers is backed up, dropped and restored, then every table has the same rows', async () => {
    sh('scripts/db.sh', ['fresh-db', BACKUP_DB]);
    const url = sh('scripts/db.sh', ['url', BACKUP_DB]).trim();
    let dataSource = createDataSource(url, { poolSize: 2 });
    await dataSource.initialize();
    const config = await testConfig({ DATABASE_URL: url });
    const mailer = createSmtpMailer(config.smtpUrl, config.mailFrom);
    const dir = mkdtempSync(path.join(tmpdir(), 'lamplight-backups-'));
    try {
      await migrate(dataSource);
      const app = createApp({ config, dataSource, mailer });
      const { accessToken } = await registerReader(app);
      const changes = ['The Ferryman’s Almanac', 'Nine Winters at Kestrel Point'].map((title) => fieldChange(randomUUID(), 'title', title, { wall: Date.now() }));
      await request(app).post('/api/sync/push').set(bearer(accessToken)).send({ deviceId: 'spec', changes }).expect(200);
      // Covers are stored in PostgreSQL (uploads.bytes), so the dump carries them.
      await request(app).post('/api/uploads').set(bearer(accessToken)).attach('file', uniquePng(), { filename: 'cover.png', contentType: 'image/png' }).expect(201);
      const before = await fingerprint(dataSource);
      expect(before['uploads']).toMatch(/^1 rows/);
      expect(before['books']).toMatch(/^2 rows/);

      const env = { LAMPLIGHT_BACKUP_DIR: dir, LAMPLIGHT_BACKUP_KEEP: '2' };
      for (let n = 0; n < 3; n++) sh('scripts/backup.sh', [url], env);
      const files = readdirSync(dir).sort();
      expect(files.length).toBe(2); // retention kept the newest two
      expect(files.every((file) => /^lamplight-lamplight_backup-\d{8}T\d{9}Z\.dump$/.test(file))).toBeTrue();

      await dataSource.destroy();
      sh('scripts/db.sh', ['fresh-db', BACKUP_DB]); // dropped and made again, empty
      sh('scripts/restore.sh', ['--yes', path.join(dir, files[1]!), url]);

      dataSource = createDataSource(url, { poolSize: 2 });
      await dataSource.initialize();
      expect(await fingerprint(dataSource)).toEqual(before);
    } finally {
      mailer.close();
      rmSync(dir, { recursive: true, force: true });
      if (dataSource.isInitialized) await dataSource.destroy();
    }
  }, 60_000);

  it('When restore is run without --yes, then it refuses and says why', () => {
    let message = '';
    try {
      execFileSync('bash', ['scripts/restore.sh', '/nonexistent.dump'], { cwd: ROOT, encoding: 'utf8', stdio: 'pipe' });
    } catch (error) {
      message = String((error as { stderr?: string }).stderr);
    }
    expect(message).toContain('--yes says you mean it');
  });
});
