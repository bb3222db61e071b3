import { randomUUID } from 'node:crypto';

import type { FieldChange } from '../../shared/api/sync';
import { HlcClock } from '../../shared/sync/hlc';
import { mergeChanges, type FieldState } from '../../shared/sync/merge-changes';
import { registerReader } from '../support/accounts';
import { asObject, SyncClient } from '../support/sync-client';
import { startTestServer, type RunningServer } from '../support/test-server';

/** A small deterministic random source, so a failure can be replayed from its seed. */
function random(seed: number) {
  let state = seed;
  return () => (state = (state * 1103515245 + 12345) % 2 ** 31) / 2 ** 31;
}

/**
 * One device's edits: random fields of a few shared rows, stamped by the device's own HLC whose
 * physical clock runs a little fast or slow, split into batches.
 */
function deviceEdits(node: string, rows: readonly string[], skewMs: number, rand: () => number): FieldChange[][] {
  let physical = Date.now() + skewMs;
  const clock = new HlcClock(node, () => physical);
  const fields: [string, () => unknown][] = [
    ['title', () => `Title ${Math.floor(rand() * 1000)}`],
    ['status', () => ['tbr', 'reading', 'paused', 'finished', 'dnf'][Math.floor(rand() * 5)]],
    ['rating', () => (rand() < 0.2 ? null : Math.ceil(rand() * 10) / 2)],
    ['pageCount', () => 100 + Math.floor(rand() * 500)],
    ['deleted', () => rand() < 0.1],
  ];
  const batches: FieldChange[][] = [];
  for (let b = 0; b < 6; b++) {
    const batch: FieldChange[] = [];
    for (let n = 0; n < 25; n++) {
      physical += Math.floor(rand() * 3); // often the same millisecond: the counter works
      const [field, value] = fields[Math.floor(rand() * fields.length)]!;
      const rowId = rows[Math.floor(rand() * rows.length)]!;
      batch.push({ id: randomUUID(), collection: 'books', rowId, field, value: value(), hlc: clock.tick() });
    }
    batches.push(batch);
  }
  return batches;
}

describe('Sync under concurrency', () => {
  let server: RunningServer;
  beforeAll(async () => (server = await startTestServer()));
  afterAll(() => server.close());

  it('When 4 devices push concurrently with duplicated batches while another follows the cursor, then both equal the reference LWW model', async () => {
    const reader = await registerReader(server.app);
    const rand = random(20261201);
    const rows = Array.from({ length: 6 }, () => randomUUID());
    const devices = ['tablet', 'laptop', 'phone', 'e-reader'].map((node, n) => ({
      client: new SyncClient(server.baseUrl, reader.accessToken, node),
      batches: deviceEdits(node, rows, (n - 1.5) * 40, rand),
    }));
    const everything = devices.flatMap((device) => device.batches.flat());

    let pushing = true;
    const follower = new SyncClient(server.baseUrl, reader.accessToken);
    const follow = (async () => {
      let state: FieldState = new Map();
      let cursor: string | undefined;
      let pulls = 0;
      while (pushing) {
        const page = await follower.pull(cursor, 7);
        state = mergeChanges(state, page.changes);
        cursor = page.cursor;
        pulls++;
      }
      // Catch up with whatever committed after the last pull.
      const rest = await follower.pullAll(cursor, 7, state);
      return { state: rest.state, pulls };
    })();

    const statuses = await Promise.all(
      devices.map(async ({ client, batches }) => {
        const seen: number[] = [];
        for (const batch of batches) {
          // Every batch goes twice, the copy racing the original (a retry after a lost answer).
          const [first, second] = await Promise.all([client.push(batch), client.push(batch)]);
          seen.push(first.status, second.status);
          // Whichever copy came second changed nothing: each change took effect at most once.
          expect(Math.min(first.body.applied, second.body.applied)).toBe(0);
          expect(first.body.applied + first.body.duplicates + first.body.superseded).toBe(batch.length);
          expect(second.body.applied + second.body.duplicates + second.body.superseded).toBe(batch.length);
        }
        return seen;
      }),
    );
    pushing = false;
    const followed = await follow;
    const fresh = await new SyncClient(server.baseUrl, reader.accessToken).pullAll(undefined, 50);

    const reference = asObject(mergeChanges(new Map(), everything));
    expect(statuses.flat().every((status) => status === 200)).toBeTrue();
    expect(followed.pulls).toBeGreaterThan(1);
    expect(asObject(fresh.state)).withContext('fresh pull').toEqual(reference);
    expect(asObject(followed.state)).withContext('cursor follower').toEqual(reference);
  });
});
