import { retryDelayMs } from './sync-cycle';

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
