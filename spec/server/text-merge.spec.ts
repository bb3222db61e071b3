import { randomUUID } from 'node:crypto';

import * as Y from 'yjs';

import type { PulledChange } from '../../shared/api/sync';
import { initialTextState } from '../../shared/text/initial-text-state';
import { loadTextDoc, textDocName, textOf } from '../../shared/text/text-doc';
import { decodeTextBytes, encodeTextBytes } from '../../shared/text/text-value';
import { compactTexts } from '../../sync-server/src/jobs/compact-texts.job';
import { startJobRunner } from '../../sync-server/src/jobs/job-runner';
import { registerReader } from '../support/accounts';
import { fieldChange, SyncClient } from '../support/sync-client';
import { testDatabaseUrl, testDataSource } from '../support/test-database';
import { startTestServer, type RunningServer } from '../support/test-server';

const NOW = Date.now();

/** A device's copy of one page body: a Yjs document, edited like the page editor does. */
class Device {
  readonly doc: Y.Doc;
  private clock = 0;
  constructor(
    readonly name: string,
    readonly rowId: string,
    state: Uint8Array,
  ) {
    this.doc = loadTextDoc([state]);
  }
  get key() {
    return textDocName('notebookPages', this.rowId, 'body');
  }
  get text() {
    return textOf(this.doc, this.key);
  }
  /** An edit, as the change the device would push. */
  edit(change: (text: Y.Text) => void) {
    const before = Y.encodeStateVector(this.doc);
    change(this.doc.getText(this.key));
    const update = Y.encodeStateAsUpdate(this.doc, before);
    return fieldChange(this.rowId, 'body', { yjs: encodeTextBytes(update) }, { wall: NOW, counter: this.clock++, node: this.name }, 'notebookPages');
  }
  receive(pulled: PulledChange) {
    Y.applyUpdate(this.doc, decodeTextBytes(pulled.state as string)!);
  }
}

const bodyOf = (changes: readonly PulledChange[], rowId: string) => changes.find((c) => c.rowId === rowId && c.field === 'body')!;

describe('mergeable texts (/api/sync with Yjs updates)', () => {
  let server: RunningServer;

  beforeAll(async () => {
    server = await startTestServer();
  });
  afterAll(() => server.close());

  async function reader() {
    const signedIn = await registerReader(server.app);
    return { ...signedIn, client: new SyncClient(server.baseUrl, signedIn.accessToken) };
  }

  async function newPage(client: SyncClient, text: string) {
    const rowId = randomUUID();
    const state = initialTextState(textDocName('notebookPages', rowId, 'body'), text);
    const pushed = await client.push([
      fieldChange(rowId, 'title', 'Chapter notes', { wall: NOW }, 'notebookPages'),
      fieldChange(rowId, 'body', { yjs: encodeTextBytes(state) }, { wall: NOW }, 'notebookPages'),
    ]);
    expect(pushed.status).toBe(200);
    return rowId;
  }

  describe('POST /api/sync/push', () => {
    it('When two devices edit one page offline, then the pull keeps both edits and its text is exactly what a device shows', async () => {
      const { client } = await reader();
      const rowId = await newPage(client, 'The lighthouse keeper kept a log.');
      const base = bodyOf((await client.pull()).changes, rowId);
      const tablet = new Device('tablet', rowId, decodeTextBytes(base.state as string)!);
      const laptop = new Device('laptop', rowId, decodeTextBytes(base.state as string)!);

      const added = tablet.edit((t) => t.insert(t.length, '\nShe wrote in it every night.'));
      const fixed = laptop.edit((t) => t.delete(4, 11)); // "lighthouse " → "The keeper…"
      expect((await client.push([added])).body.applied).toBe(1);
      expect((await client.push([fixed])).body.applied).toBe(1);

      const pulled = bodyOf((await client.pull()).changes, rowId);
      // Reference: a fresh Yjs document given only the pulled state shows the pulled text.
      const fresh = loadTextDoc([decodeTextBytes(pulled.state as string)!]);
      expect(textOf(fresh, tablet.key)).toBe(pulled.value as string);
      expect(pulled.value).toBe('The keeper kept a log.\nShe wrote in it every night.');
      tablet.receive(pulled);
      laptop.receive(pulled);
      expect(tablet.text).toBe(pulled.value as string);
      expect(laptop.text).toBe(pulled.value as string);
    });

    it('When an update is sent again, then it counts as a duplicate and changes nothing', async () => {
      const { client } = await reader();
      const rowId = await newPage(client, 'Once.');
      const device = new Device('a', rowId, decodeTextBytes(bodyOf((await client.pull()).changes, rowId).state as string)!);
      const change = device.edit((t) => t.insert(5, ' Twice?'));
      expect((await client.push([change])).body).toEqual(jasmine.objectContaining({ applied: 1, duplicates: 0 }));
      expect((await client.push([{ ...change, id: randomUUID() }])).body).toEqual(jasmine.objectContaining({ applied: 0, duplicates: 1 }));
      expect(bodyOf((await client.pull()).changes, rowId).value).toBe('Once. Twice?');
    });

    it('When an app that predates mergeable texts sends a whole text, then only the characters it changed become an edit', async () => {
      const { client } = await reader();
      const rowId = await newPage(client, 'alpha beta gamma');
      const device = new Device('new', rowId, decodeTextBytes(bodyOf((await client.pull()).changes, rowId).state as string)!);
      await client.push([device.edit((t) => t.insert(t.length, ' delta'))]);
      const old = await client.push([fieldChange(rowId, 'body', 'ALPHA beta gamma', { wall: NOW, node: 'old-app' }, 'notebookPages')]);
      expect(old.status).toBe(200);
      // The old app's whole text is compared with the server's current text, so its edit
      // ("ALPHA") applies and the newer "delta" it never saw is removed, as last-writer-wins did.
      expect(bodyOf((await client.pull()).changes, rowId).value).toBe('ALPHA beta gamma');
    });

    describe('When an update is bad, then that change alone is refused with a 400 and nothing of its batch is applied', () => {
      const cases: { name: string; value: (rowId: string, stored: Uint8Array) => unknown; reason: string }[] = [
        { name: 'not base64', value: () => ({ yjs: '%%%' }), reason: 'yjs must be a base64 Yjs update' },
        { name: 'not a Yjs update', value: () => ({ yjs: encodeTextBytes(new Uint8Array([250, 250, 250, 250])) }), reason: 'not a Yjs update' },
        {
          name: 'made for another page',
          value: () => ({ yjs: encodeTextBytes(initialTextState(textDocName('notebookPages', randomUUID(), 'body'), 'elsewhere')) }),
          reason: 'belongs to another text',
        },
        {
          name: 'building on history this page never had',
          value: (rowId) => {
            const other = new Device('x', rowId, initialTextState(textDocName('notebookPages', rowId, 'body'), 'another past'));
            return other.edit((t) => t.insert(3, '!')).value;
          },
          reason: 'builds on characters',
        },
        {
          name: 'a NUL, which PostgreSQL text cannot hold',
          value: (rowId, stored) => new Device('x', rowId, stored).edit((t) => t.insert(0, 'nul\u0000here')).value,
          reason: 'contains a NUL',
        },
      ];
      for (const bad of cases) {
        it(`(${bad.name})`, async () => {
          const { client } = await reader();
          const rowId = await newPage(client, 'Kept safe.');
          const stored = decodeTextBytes(bodyOf((await client.pull()).changes, rowId).state as string)!;
          const good = new Device('a', rowId, stored).edit((t) => t.insert(0, '» '));
          const refused = fieldChange(rowId, 'body', bad.value(rowId, stored), { wall: NOW, node: 'b' }, 'notebookPages');
          const result = await client.push([good, refused]);
          expect(result.status).toBe(400);
          expect(result.body.error!.details).toEqual([jasmine.objectContaining({ index: 1, id: refused.id, reason: jasmine.stringContaining(bad.reason) })]);
          expect(bodyOf((await client.pull()).changes, rowId).value).toBe('Kept safe.');
          expect((await client.push([good])).body.applied).toBe(1);
        });
      }
    });

    it('When an update would make a text longer than its field allows, then it is refused (a session note: 2,000 characters)', async () => {
      const { client } = await reader();
      const rowId = randomUUID();
      const key = textDocName('sessions', rowId, 'note');
      const doc = loadTextDoc([]);
      const first = fieldChange(rowId, 'note', { yjs: encodeTextBytes(initialTextState(key, 'Fine.')) }, { wall: NOW }, 'sessions');
      expect((await client.push([first])).status).toBe(200);
      Y.applyUpdate(doc, initialTextState(key, 'Fine.'));
      const vector = Y.encodeStateVector(doc);
      doc.getText(key).insert(5, 'y'.repeat(1_996));
      const tooLong = fieldChange(rowId, 'note', { yjs: encodeTextBytes(Y.encodeStateAsUpdate(doc, vector)) }, { wall: NOW, counter: 1 }, 'sessions');
      const result = await client.push([tooLong]);
      expect(result.status).toBe(400);
      expect(result.body.error!.details).toEqual([
        jasmine.objectContaining({ index: 0, reason: 'sessions.note update would make the text longer than 2000 characters' }),
      ]);
    });

    it('When a page was saved as plain text before texts became mergeable, then an edit built on its initial state merges without doubling it', async () => {
      const {
        client,
        user: { id: userId },
      } = await reader();
      const rowId = randomUUID();
      const dataSource = await testDataSource();
      // As the migration left it: a plain text column and no state yet (the server then uses the
      // initial state every device computes from the same text).
      await dataSource.query(
        `INSERT INTO notebook_pages (user_id, id, body, clocks, seq) VALUES ($1, $2, 'Old notes', '{"body":"000000000000001:00000:old"}', nextval('sync_seq'))`,
        [userId, rowId],
      );
      const device = new Device('a', rowId, initialTextState(textDocName('notebookPages', rowId, 'body'), 'Old notes'));
      const change = device.edit((t) => t.insert(9, ', new thoughts'));
      expect((await client.push([change])).status).toBe(200);
      expect(bodyOf((await client.pull()).changes, rowId).value).toBe('Old notes, new thoughts');
    });
  });

  describe('compaction job (pg-boss)', () => {
    it('When the job compacts a much-edited page, then the state shrinks, the text is the same and a fresh pull gets the compact state', async () => {
      const {
        client,
        user: { id: userId },
      } = await reader();
      const rowId = await newPage(client, '');
      const device = new Device('a', rowId, new Uint8Array([0, 0]));
      const changes = [];
      for (let n = 0; n < 200; n++) {
        const sentence = `Draft sentence number ${n}, written and then mostly thrown away. `;
        changes.push(device.edit((t) => t.insert(t.length, sentence)));
        // Most drafts are deleted again: their characters are what compaction drops.
        if (n % 4 !== 0) changes.push(device.edit((t) => t.delete(t.length - sentence.length, sentence.length)));
      }
      for (let i = 0; i < changes.length; i += 100) expect((await client.push(changes.slice(i, i + 100))).status).toBe(200);
      const before = bodyOf((await client.pull()).changes, rowId);
      const dataSource = await testDataSource();
      await dataSource.query(`UPDATE text_states SET updated_at = now() - interval '1 minute' WHERE user_id = $1`, [userId]);

      const runner = await startJobRunner(testDatabaseUrl(), dataSource, [compactTexts]);
      try {
        await runner.send('compact-texts');
        const deadline = Date.now() + 30_000;
        while (Date.now() < deadline) {
          const [row] = await dataSource.query('SELECT compacted_at FROM text_states WHERE user_id = $1 AND row_id = $2', [userId, rowId]);
          if (row.compacted_at) break;
          await new Promise((resolve) => setTimeout(resolve, 250));
        }
      } finally {
        await runner.stop();
      }

      const [done] = await dataSource.query('SELECT compacted_at FROM text_states WHERE user_id = $1 AND row_id = $2', [userId, rowId]);
      expect(done.compacted_at).withContext('the job ran').not.toBeNull();
      const after = bodyOf((await client.pull()).changes, rowId);
      expect(after.value).toBe(before.value);
      expect(after.value).toBe(device.text);
      // Reference: Yjs's own decoding of both states shows the same text.
      const key = textDocName('notebookPages', rowId, 'body');
      expect(textOf(loadTextDoc([decodeTextBytes(after.state as string)!]), key)).toBe(device.text);
      expect((after.state as string).length).toBeLessThan((before.state as string).length);
    }, 90_000);
  });

  describe('GET /api/sync/pull size', () => {
    it('When a long page has had many edits, then a fresh device pulls one state, smaller than the updates that made it', async () => {
      const { client } = await reader();
      const rowId = await newPage(client, 'Opening line.\n');
      const device = new Device('a', rowId, decodeTextBytes(bodyOf((await client.pull()).changes, rowId).state as string)!);
      let pushedBytes = 0;
      const changes = [];
      for (let n = 0; n < 400; n++) {
        const change = device.edit((t) => t.insert(Math.floor(t.length / 2), `word${n} `));
        pushedBytes += (change.value as { yjs: string }).yjs.length;
        changes.push(change);
      }
      for (let i = 0; i < changes.length; i += 200) expect((await client.push(changes.slice(i, i + 200))).status).toBe(200);

      const fresh = await client.pull();
      const bodies = fresh.changes.filter((c) => c.rowId === rowId && c.field === 'body');
      expect(bodies.length).toBe(1);
      expect(bodies[0]!.value).toBe(device.text);
      const stateBytes = (bodies[0]!.state as string).length;
      expect(stateBytes).toBeLessThan(pushedBytes);
      expect(textOf(loadTextDoc([decodeTextBytes(bodies[0]!.state as string)!]), device.key)).toBe(device.text);
    });
  });

  describe('GET /api/texts/:collection/:rowId/:field/versions', () => {
    it('When a page was edited, then its history lists the current text; other fields and bad ids are refused', async () => {
      const { client, accessToken } = await reader();
      const rowId = await newPage(client, 'First draft.');
      const get = (path: string) => fetch(`${server.baseUrl}/api/texts/${path}`, { headers: { authorization: `Bearer ${accessToken}` } });
      const history = await get(`notebookPages/${rowId}/body/versions`);
      expect(history.status).toBe(200);
      expect((await history.json()).versions).toEqual([{ savedAt: jasmine.any(String), text: 'First draft.' }]);
      expect((await get(`notebookPages/${rowId}/title/versions`)).status).toBe(404);
      expect((await get(`notebookPages/not-a-uuid/body/versions`)).status).toBe(400);
    });
  });
});
