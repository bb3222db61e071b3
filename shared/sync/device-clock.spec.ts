import { clockOffsetMs, restampClocks, restampFloor } from './device-clock';
import { formatHlc, parseHlc } from './hlc';

const at = (wall: number, counter = 0, node = 'dev-a') => formatHlc({ wall, counter, node });
const DAY = 24 * 60 * 60 * 1000;
const NOW = Date.UTC(2026, 11, 4, 12);

describe('clockOffsetMs', () => {
  // Cristian (1989): the server's reading belongs to the middle of the round trip.
  it('compares the server time with the middle of the request', () => {
    expect(clockOffsetMs(NOW + 3 * DAY, NOW - 200, NOW + 200)).toBe(3 * DAY);
  });

  it('counts under a minute as none (network noise)', () => {
    expect(clockOffsetMs(NOW + 59_000, NOW, NOW)).toBe(0);
  });
});

describe('restampFloor', () => {
  const from = at(NOW + 3 * DAY);

  it('is the greatest of what was seen and the device’s own clocks below the first refused one', () => {
    expect(restampFloor(from, at(NOW - DAY, 0, 'dev-b'), [at(NOW + 60_000), at(NOW - 2 * DAY)])).toBe(at(NOW + 60_000));
  });

  it('ignores clocks that are themselves being re-stamped (at or above the first refused one)', () => {
    expect(restampFloor(from, at(NOW - DAY, 0, 'dev-b'), [from, at(NOW + 4 * DAY), undefined, null])).toBe(at(NOW - DAY, 0, 'dev-b'));
  });

  it('is null when nothing was seen or kept', () => {
    expect(restampFloor(from, null, [])).toBeNull();
  });
});

describe('restampClocks', () => {
  it('gives one new clock per old one, in the given order, after the floor, from the corrected time', () => {
    const floor = at(NOW + 60_000, 7);
    const old = [at(NOW + 3 * DAY, 0), at(NOW + 3 * DAY, 0), at(NOW + 3 * DAY, 1), at(NOW + 3 * DAY + 5)];
    const renamed = restampClocks(old, 'dev-a', () => NOW, floor);
    expect(renamed.size).toBe(3); // fields written together keep sharing one clock
    const next = [...renamed.values()];
    expect(next[0]! > floor).toBeTrue();
    expect([...next].sort()).toEqual(next);
    // None is ahead of the corrected time by more than the floor allows.
    for (const hlc of next) expect(parseHlc(hlc)!.wall).toBeLessThanOrEqual(NOW + 60_000);
  });
});
