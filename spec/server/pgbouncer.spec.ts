import { randomUUID } from 'node:crypto';

import request from 'supertest';
import type { DataSource } from 'typeorm';

import { startPgBouncer, type RunningPgBouncer } from '../../scripts/ops/pgbouncer';
import { freePort } from '../../scripts/ops/processes';
import { createApp } from '../../sync-server/src/app';
import { createDataSource } from '../../sync-server/src/data-access/data-source';
import { migrate } from '../../sync-server/src/data-access/migrate';
import { createSmtpMailer, type Mailer } from '../../sync-server/src/mail/mailer';
import { bearer, registerReader } from '../support/accounts';
import { fieldChange } from '../support/sync-client';
import { testDatabaseUrl, testDataSource } from '../support/test-database';
import { testConfig } from '../support/test-server';

/**
 * The server through PgBouncer in transaction mode with only two server connections, so
 * consecutive transactions of one pooled client land on different PostgreSQL sessions: nothing
 * may rely on session state (prepared statements, session advisory locks, SET).
 */
describe('The server through PgBouncer (transaction pooling)', () => {
  let bouncer: RunningPgBouncer | undefined;
  let missing: string | undefined;
  let dataSource: DataSource;
  let mailer: Mailer;

  beforeAll(async () => {
    await testDataSource(); // migrated directly first
    try {
      bouncer = await startPgBouncer(testDatabaseUrl(), await freePort(), 2);
    } catch (error) {
      if (!/is missing/.test(String(error))) throw error;
      missing = String(error);
      return;
    }
    dataSource = createDataSource(bouncer.databaseUrl, { poolSize: 8 });
    await dataSource.initialize();
  }, 30_000);

  afterAll(async () => {
    mailer?.close();
    if (dataSource?.isInitialized) await dataSource.destroy();
    await bouncer?.stop();
  });

  async function app() {
    if (!bouncer) pending(missing);
    const config = await testConfig({ DATABASE_URL: bouncer!.databaseUrl, LAMPLIGHT_DB_TRANSACTION_POOLING: 'true' });
    mailer ??= createSmtpMailer(config.smtpUrl, config.mailFrom);
    return createApp({ config, dataSource, mailer });
  }

  it('When three starts migrate at once through it, then they take turns on the transaction lock and all finish', async () => {
    await app();
    const others = [createDataSource(bouncer!.databaseUrl, { poolSize: 1 }), createDataSource(bouncer!.databaseUrl, { poolSize: 1 })];
    await Promise.all(others.map((other) => other.initialize()));
    try {
      await expectAsync(Promise.all([migrate(dataSource), ...others.map((other) => migrate(other))])).toBeResolved();
    } finally {
      await Promise.all(others.map((other) => other.destroy()));
    }
  });

  it('When readers push many kinds of changes concurrently and pull, then every push is applied and pulled back', async () => {
    const server = await app();
    const readers = await Promise.all([1, 2, 3].map(() => registerReader(server)));
    const fieldSets: [string, unknown][][] = [
      [['title', 'The Salt Archive']],
      [
        ['title', 'Lanterns in Fog'],
        ['rating', 4],
      ],
      [['status', 'reading']],
      [
        ['title', 'Under Alder Bridge'],
        ['pageCount', 312],
      ],
    ];
    const pushes = readers.flatMap((reader, r) =>
      Array.from({ length: 8 }, (_, n) => {
        const rowId = randomUUID();
        const changes = fieldSets[(r + n) % fieldSets.length]!.map(([field, value]) => fieldChange(rowId, field, value, { wall: Date.now() }));
        return request(server)
          .post('/api/sync/push')
          .set(bearer(reader.accessToken))
          .send({ deviceId: `device-${r}`, changes });
      }),
    );

    const answers = await Promise.all(pushes);

    expect(answers.map((answer) => answer.status)).toEqual(answers.map(() => 200));
    expect(answers.every((answer) => answer.body.applied >= 1 && answer.body.duplicates === 0)).toBeTrue();
    for (const reader of readers) {
      const pulled = await request(server).get('/api/sync/pull').set(bearer(reader.accessToken)).expect(200);
      expect(new Set(pulled.body.changes.map((change: { rowId: string }) => change.rowId)).size).toBe(8);
    }
  });
});
