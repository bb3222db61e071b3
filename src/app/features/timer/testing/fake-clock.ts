import type { Clock } from '../../../core/time/clock';

/** A clock for specs: time moves only when `advance` is called, and ticks fire as it passes. */
export class FakeClock implements Clock {
  private readonly tickers = new Set<{ ms: number; next: number; tick: () => void }>();

  constructor(private time = Date.parse('2026-03-08T20:14:00Z')) {}

  now(): number {
    return this.time;
  }

  every(ms: number, tick: () => void): () => void {
    const ticker = { ms, next: this.time + ms, tick };
    this.tickers.add(ticker);
    return () => this.tickers.delete(ticker);
  }

  /** Moves time on; each ticker whose period has passed fires once (as a throttled background tab would). */
  advance(ms: number): void {
    this.time += ms;
    for (const ticker of [...this.tickers]) {
      if (ticker.next > this.time) continue;
      ticker.next = this.time + ticker.ms;
      ticker.tick();
    }
  }

  /** How many tickers are running (a stopped timer should leave none). */
  get running(): number {
    return this.tickers.size;
  }
}
