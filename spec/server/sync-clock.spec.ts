import { randomUUID } from 'node:crypto';

import { dateLooksWrong } from '../../shared/sync/device-clock';
import { parseHlc } from '../../shared/sync/hlc';
import { registerReader } from '../support/accounts';
import { MemoryDevice } from '../support/memory-device';
import { startTestServer, type RunningServer } from '../support/test-server';

const DAY = 24 * 60 * 60 * 1000;

describe('A device whose date is wrong still syncs', () => {
  let server: RunningServer;
  beforeAll(async () => (server = await startTestServer()));
  afterAll(() => server.close());

  async function devices(skewMs: number) {
    const { accessToken } = await registerReader(server.app);
    return {
      wrong: new MemoryDevice(server.baseUrl, accessToken, 'wrong-date', skewMs),
      right: new MemoryDevice(server.baseUrl, accessToken, 'right-date'),
      fresh: () => new MemoryDevice(server.baseUrl, accessToken, randomUUID()),
    };
  }

  it('3 days ahead: its refused changes are stamped again from the server time, in order and after what it saw, and all sync', async () => {
    const { wrong, right, fresh } = await devices(3 * DAY);
    const row = randomUUID();
    right.write('books', row, { title: 'From the right device', status: 'tbr' });
    await right.sync();
    await wrong.sync(); // sees the right device's book first
    wrong.write('books', row, { title: 'First edit' });
    wrong.write('books', row, { title: 'Second edit', rating: 4 });

    const report = await wrong.sync();
    const reader = fresh();
    await reader.sync();

    expect(report.refused).toBe(0);
    expect(wrong.setAsideChanges).toEqual([]);
    expect(wrong.outbox).toEqual([]);
    expect(dateLooksWrong(wrong.offsetMs)).toBeTrue();
    const book = reader.rows.get(`books/${row}`)!;
    expect(book['title']).toBe('Second edit'); // order kept
    expect(book['rating']).toBe(4);
    expect(book._hlc['title']! > right.rows.get(`books/${row}`)!._hlc['title']!).toBeTrue(); // after what it saw
    expect(Math.abs(parseHlc(book._hlc['title']!)!.wall - Date.now())).toBeLessThan(5 * 60_000); // stamped from the server's time
  });

  it('3 days behind: once it has heard the server time, its later edit wins over an earlier one from a right device', async () => {
    const { wrong, right, fresh } = await devices(-3 * DAY);
    const row = randomUUID();
    right.write('books', row, { title: 'Earlier, on the right device' });
    await right.sync();
    await wrong.sync();

    wrong.write('books', row, { title: 'Later, on the device 3 days behind' });
    const report = await wrong.sync();
    const reader = fresh();
    await reader.sync();

    expect(report.refused).toBe(0);
    expect(dateLooksWrong(wrong.offsetMs)).toBeTrue();
    expect(reader.rows.get(`books/${row}`)?.['title']).toBe('Later, on the device 3 days behind');
  });
});
