import { TestBed } from '@angular/core/testing';

import { openTestJournal, type TestJournal } from '../../core/testing/test-journal';
import { JournalExport } from './journal-export';
import { JournalImport } from './journal-import';

const json = (value: unknown) => new Blob([JSON.stringify(value)], { type: 'application/json' });

describe('JournalExport and JournalImport (IndexedDB)', () => {
  let journal: TestJournal;
  beforeEach(() => (journal = openTestJournal()));
  afterEach(() => journal.close());

  async function exported(): Promise<Record<string, unknown>> {
    return JSON.parse(await (await TestBed.inject(JournalExport).everything()).text()) as Record<string, unknown>;
  }

  it('exports every row with its clocks, deleted ones by id, and reports progress', async () => {
    const bookId = await journal.store.create('books', {
      title: 'Harbour of Small Lights',
      authors: ['Odile Ferrant'],
      format: 'print',
      status: 'tbr',
      tags: ['sea'],
    });
    const goneId = await journal.store.create('labels', { name: 'Gone', colour: 'sky', icon: 'star' });
    await journal.store.remove('labels', goneId);
    const steps: number[] = [];
    const file = JSON.parse(await (await TestBed.inject(JournalExport).everything((p) => steps.push(p.done))).text()) as {
      format: string;
      collections: Record<string, { id: string; fields: Record<string, unknown>; clocks: Record<string, string> }[]>;
    };
    expect(file.format).toBe('lamplight-export');
    const [book] = file.collections['books']!;
    expect(book!.id).toBe(bookId);
    expect(book!.fields['tags']).toEqual(['sea']);
    expect(book!.clocks['title']).toMatch(/^\d{15}:\d{5}:/);
    expect(file.collections['labels']).toEqual([{ id: goneId, fields: { deleted: true }, clocks: jasmine.any(Object) }]);
    expect(steps.at(-1)).toBe(2);
  });

  it('importing its own export changes nothing, and counts every row unchanged', async () => {
    await journal.store.create('books', { title: 'Harbour of Small Lights', authors: ['Odile Ferrant'], format: 'print', status: 'tbr' });
    await journal.store.create('readings', { review: 'Slow and lovely.' });
    const before = await journal.db.outbox.count();
    const result = await TestBed.inject(JournalImport).importJson(json(await exported()));
    expect(result).toEqual({ summary: { added: 0, updated: 0, unchanged: 2, refused: [] } });
    expect(await journal.db.outbox.count()).toBe(before);
  });

  it('adds rows of another journal with the file clocks, in the outbox for the server', async () => {
    await journal.store.create('books', { title: 'Harbour of Small Lights', authors: ['Odile Ferrant'], format: 'print', status: 'tbr' });
    const file = await exported();
    await journal.db.rows('books').clear();
    await journal.db.outbox.clear();
    const result = await TestBed.inject(JournalImport).importJson(json(file));
    expect(result).toEqual({ summary: { added: 1, updated: 0, unchanged: 0, refused: [] } });
    expect(await exported()).toEqual({ ...file, exportedAt: jasmine.any(String) });
    const fileBook = (file['collections'] as Record<string, { clocks: Record<string, string> }[]>)['books']![0]!;
    const titleChange = (await journal.db.outbox.toArray()).find((change) => change.field === 'title')!;
    expect(titleChange.hlc).toBe(fileBook.clocks['title']!);
  });

  it('refuses bad files with a sentence and changes nothing', async () => {
    await journal.store.create('books', { title: 'Harbour of Small Lights', authors: [], format: 'print', status: 'tbr' });
    const before = await journal.db.outbox.count();
    const importer = TestBed.inject(JournalImport);
    const problems = [
      await importer.importJson(new Blob(['title,author\r\n'])),
      await importer.importJson(json({ shelves: [] })),
      await importer.importJson(json({ format: 'lamplight-export', version: 9, collections: {} })),
      await importer.importJson(new Blob([])),
      await importer.importJson({ size: 200 * 1024 * 1024 } as Blob),
    ];
    expect(problems.map((p) => ('problem' in p ? p.problem.split('.')[0] : ''))).toEqual([
      'This file is not JSON, so it is not a Lamplight export',
      'This JSON file is not a Lamplight export (it has no "format": "lamplight-export")',
      'This export was made by a newer Lamplight (file version 9; this app reads 1)',
      'This file is empty',
      'This file is larger than 50 MB, too large to be a Lamplight export',
    ]);
    expect(await journal.db.outbox.count()).toBe(before);
  });

  it('refuses a bad row with its reason and takes the others', async () => {
    const id = crypto.randomUUID();
    const clock = '001764633600000:00000:elsewhere';
    const row = (rating: number) => ({
      id: rating > 5 ? crypto.randomUUID() : id,
      fields: { title: 'A Kettle for Winter', rating },
      clocks: { title: clock, rating: clock },
    });
    const result = await TestBed.inject(JournalImport).importJson(
      json({ format: 'lamplight-export', version: 1, exportedAt: '2026-12-04T10:00:00.000Z', collections: { books: [row(4), row(8)], shelves: [] } }),
    );
    expect('summary' in result && result.summary.added).toBe(1);
    expect('summary' in result && result.summary.refused.map((r) => r.reason)).toEqual([
      'rating must be at most 5',
      'shelves is not a collection this version of Lamplight knows',
    ]);
    expect((await journal.store.get('books', id))?.title).toBe('A Kettle for Winter');
  });

  it('carries a book’s cover as a data URL with its SHA-256 id, and an import into a fresh journal restores the picture', async () => {
    // A 1×1 PNG (ISO 15948); its id is its hex SHA-256 (FIPS 180-4, worked out outside the app).
    const png = 'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNk+M9QDwADhgGAWjR9awAAAABJRU5ErkJggg==';
    const coverId = '6b7fa434f92a8b80aab02d9bf1a12e49ffcae424e4013a1c4f68b67e3d2bbcd0';
    const bytes = Uint8Array.from(atob(png), (char) => char.charCodeAt(0));
    await journal.db.covers.add({ id: coverId, blob: new Blob([bytes], { type: 'image/png' }), mediaType: 'image/png', state: 'uploaded' });
    await journal.store.create('books', { title: 'Harbour of Small Lights', authors: ['Odile Ferrant'], format: 'print', status: 'tbr', coverId });
    const file = await exported();
    expect(file['covers']).toEqual([{ id: coverId, dataUrl: `data:image/png;base64,${png}` }]);

    await journal.db.covers.clear();
    await journal.db.rows('books').clear();
    const tampered = { id: 'f'.repeat(64), dataUrl: `data:image/png;base64,${png}` };
    const result = await TestBed.inject(JournalImport).importJson(json({ ...file, covers: [...(file['covers'] as unknown[]), tampered] }));
    expect('summary' in result && result.summary.added).toBe(2); // the book and its cover
    expect('summary' in result && result.summary.refused.map((r) => r.id)).toEqual(['f'.repeat(64)]);
    const restored = await journal.db.covers.get(coverId);
    expect(restored?.state).toBe('pending'); // uploaded to this account like a cover chosen here
    expect(new Uint8Array(await restored!.blob.arrayBuffer())).toEqual(bytes);
    expect(await journal.db.covers.get('f'.repeat(64))).toBeUndefined();
  });
});
