import { randomUUID } from 'node:crypto';

import { registerReader } from '../support/accounts';
import { MemoryDevice } from '../support/memory-device';
import { startTestServer, type RunningServer } from '../support/test-server';

describe('The shared sync cycle against the real server', () => {
  let server: RunningServer;
  beforeAll(async () => (server = await startTestServer()));
  afterAll(() => server.close());

  it('When two devices edit offline and then sync, then both end in the same merged state', async () => {
    const { accessToken } = await registerReader(server.app);
    const tablet = new MemoryDevice(server.baseUrl, accessToken, 'tablet');
    const laptop = new MemoryDevice(server.baseUrl, accessToken, 'laptop');
    const book = randomUUID();
    tablet.write('books', book, { title: 'The Weir at Night', format: 'print', status: 'reading', deleted: false });
    await tablet.sync();
    await laptop.sync();

    tablet.write('books', book, { title: 'The Weir at Midnight', rating: 4 });
    await new Promise((resolve) => setTimeout(resolve, 5)); // the laptop edits a moment later
    laptop.write('books', book, { pageCount: 288, rating: 3.5 });
    await tablet.sync();
    await laptop.sync();
    await tablet.sync();

    const onTablet = tablet.rows.get(`books/${book}`)!;
    const onLaptop = laptop.rows.get(`books/${book}`)!;
    expect(onTablet).toEqual(onLaptop);
    expect(onTablet['title']).toBe('The Weir at Midnight');
    expect(onTablet['pageCount']).toBe(288);
    expect(onTablet['rating']).toBe(3.5); // the later edit of the field edited on both
    expect(tablet.outbox).toEqual([]);
  });

  it('When one change is refused, then it is set aside with its reason and the rest of its batch still syncs', async () => {
    const { accessToken } = await registerReader(server.app);
    const device = new MemoryDevice(server.baseUrl, accessToken);
    const other = new MemoryDevice(server.baseUrl, accessToken);
    const book = randomUUID();
    device.write('books', book, { title: 'Kept', rating: 9 });

    const report = await device.sync();
    await other.sync();

    expect(report).toEqual({ pushed: 1, refused: 1, pulled: 1 });
    expect(device.setAsideChanges.map((r) => r.problem.reason)).toEqual(['books.rating must be at most 5']);
    expect(other.rows.get(`books/${book}`)?.['title']).toBe('Kept');
    expect(device.outbox).toEqual([]);
  });

  it('When the outbox is larger than a batch, then it goes in several pushes and arrives whole', async () => {
    const { accessToken } = await registerReader(server.app);
    const device = new MemoryDevice(server.baseUrl, accessToken);
    const other = new MemoryDevice(server.baseUrl, accessToken);
    for (let n = 0; n < 25; n++) device.write('books', randomUUID(), { title: `Volume ${n}`, status: 'tbr' });

    const report = await device.sync(7);
    await other.sync();

    expect(report.pushed).toBe(50);
    expect(other.rows.size).toBe(25);
  });
});
