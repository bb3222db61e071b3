import type { PullResponse } from '../api/sync';
import { retryDelayMs, runSyncCycle, type SyncPorts } from './sync-cycle';

describe('retryDelayMs', () => {
  it('doubles from one second and stops growing at a minute', () => {
    // With jitter fixed at its top (random → 1) the delay is the ceiling itself.
    const top = () => 0.999999;
    expect([0, 1, 2, 3, 4, 5, 6, 7, 10].map((attempt) => Math.round(retryDelayMs(attempt, top) / 1000))).toEqual([1, 2, 4, 8, 16, 32, 60, 60, 60]);
  });

  it('spreads retries over the upper half of the window ("equal jitter", common practice)', () => {
    expect(retryDelayMs(3, () => 0)).toBe(4000);
    expect(retryDelayMs(3, () => 0.5)).toBe(6000);
    for (let i = 0; i < 100; i++) {
      const delay = retryDelayMs(2);
      expect(delay).toBeGreaterThanOrEqual(2000);
      expect(delay).toBeLessThanOrEqual(4000);
    }
  });
});

describe('runSyncCycle pulling with prefetch', () => {
  it('asks for each page as soon as the one before it arrives, at most two ahead of the store, and stores them in order', async () => {
    const asked: (string | undefined)[] = [];
    const answer = new Map<string, (page: PullResponse) => void>();
    const stored: string[] = [];
    let storedOne = () => {};
    const ports: SyncPorts = {
      nextBatch: async () => [],
      acknowledge: async () => {},
      restamp: async () => {},
      setAside: async () => {},
      push: async () => ({ kind: 'applied' }),
      cursor: async () => undefined,
      pull: (cursor) =>
        new Promise((resolve) => {
          asked.push(cursor);
          answer.set(cursor ?? 'start', resolve);
        }),
      apply: (page) =>
        new Promise((resolve) => {
          stored.push(page.cursor);
          storedOne = resolve;
        }),
    };
    const page = (cursor: string, hasMore: boolean): PullResponse => ({ changes: [], cursor, hasMore, serverTime: '2026-12-05T12:00:00.000Z' });
    const settle = () => new Promise((resolve) => setTimeout(resolve, 0));

    const cycle = runSyncCycle(ports, { prefetch: true });
    await settle();
    answer.get('start')!(page('c1', true));
    await settle();
    expect(asked).toEqual([undefined, 'c1']);
    expect(stored).toEqual(['c1']);
    answer.get('c1')!(page('c2', true));
    await settle();
    expect(asked).withContext('the page after the next, while the first is stored').toEqual([undefined, 'c1', 'c2']);
    answer.get('c2')!(page('c3', true));
    await settle();
    expect(asked).withContext('two pages wait already').toEqual([undefined, 'c1', 'c2']);

    storedOne();
    await settle();
    expect(stored).toEqual(['c1', 'c2']);
    expect(asked).toEqual([undefined, 'c1', 'c2', 'c3']);
    answer.get('c3')!(page('c4', false));
    for (let n = 0; n < 2; n++) {
      storedOne();
      await settle();
    }
    storedOne();
    expect(await cycle).toEqual({ pushed: 0, refused: 0, pulled: 0 });
    expect(stored).toEqual(['c1', 'c2', 'c3', 'c4']);
    expect(asked).withContext('nothing after the last page').toEqual([undefined, 'c1', 'c2', 'c3']);
  });
});
