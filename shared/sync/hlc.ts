/**
 * Hybrid logical clocks after Kulkarni, Demirbas et al. 2014, "Logical Physical Clocks and
 * Consistent Snapshots in Globally Distributed Databases". A clock is (l, c, node): `l` the
 * greatest physical time seen (ms), `c` a counter for events within the same `l`, and the
 * device's node id to break remaining ties.
 *
 * Text form, ordered by plain string comparison:
 * `<l, 15 digits>:<c, 5 digits>:<nodeId>` — for example `001764633600000:00000:3f2a…`.
 */
export interface Hlc {
  readonly wall: number;
  readonly counter: number;
  readonly node: string;
}

/** A device never adopts a remote clock further ahead of its own wall clock than this. */
export const MAX_CLOCK_AHEAD_MS = 24 * 60 * 60 * 1000;
const MAX_COUNTER = 99_999;
const HLC_PATTERN = /^(\d{15}):(\d{5}):([A-Za-z0-9-]{1,64})$/;

export function formatHlc({ wall, counter, node }: Hlc): string {
  return `${String(wall).padStart(15, '0')}:${String(counter).padStart(5, '0')}:${node}`;
}

/** Parses the text form, or returns `null` when it is not one. */
export function parseHlc(text: string): Hlc | null {
  const match = HLC_PATTERN.exec(text);
  if (!match) return null;
  return { wall: Number(match[1]), counter: Number(match[2]), node: match[3]! };
}

/** Thrown when a remote clock is implausibly far ahead (a device with a wrong date). */
export class ClockAheadError extends Error {
  constructor(readonly remote: string) {
    super(`Clock ${remote} is more than 24 hours ahead of this device`);
    this.name = 'ClockAheadError';
  }
}

/**
 * One node's clock. `now` is injectable for tests; state can be restored from the last clock
 * this node issued (kept in storage so clocks stay monotonic across reloads).
 */
export class HlcClock {
  private wall: number;
  private counter: number;

  constructor(
    readonly node: string,
    private readonly now: () => number = Date.now,
    last?: string | null,
  ) {
    const restored = last ? parseHlc(last) : null;
    this.wall = restored?.wall ?? 0;
    this.counter = restored?.counter ?? 0;
  }

  /** The clock for a local (or send) event: `l' = l; l = max(l', pt); c = l == l' ? c + 1 : 0`. */
  tick(): string {
    const previous = this.wall;
    this.wall = Math.max(previous, this.now());
    this.counter = this.wall === previous ? this.counter + 1 : 0;
    return this.current();
  }

  /**
   * Takes in a clock seen from elsewhere (the paper's receive rule), so this node's next events
   * order after it. Refuses a clock more than 24 hours ahead of the local wall clock, unless
   * `checkedByServer`: a pulled clock was bounded by the server's own time when it was pushed
   * (`clock_ahead`), so when it looks far ahead the fault is this device's time (a wrong date, or
   * an offset measured across a jump) — refusing it would stamp the next edit below a clock this
   * device already holds, and that edit would lose to the older one on every other device.
   */
  receive(remoteText: string, { checkedByServer = false }: { checkedByServer?: boolean } = {}): void {
    const remote = parseHlc(remoteText);
    if (!remote) throw new RangeError(`Not a clock: ${remoteText}`);
    const physical = this.now();
    if (!checkedByServer && remote.wall > physical + MAX_CLOCK_AHEAD_MS) throw new ClockAheadError(remoteText);
    const previous = this.wall;
    this.wall = Math.max(previous, remote.wall, physical);
    if (this.wall === previous && this.wall === remote.wall) this.counter = Math.max(this.counter, remote.counter) + 1;
    else if (this.wall === previous) this.counter += 1;
    else if (this.wall === remote.wall) this.counter = remote.counter + 1;
    else this.counter = 0;
    this.normalise();
  }

  /** The last clock issued or seen, in text form. */
  current(): string {
    this.normalise();
    return formatHlc({ wall: this.wall, counter: this.counter, node: this.node });
  }

  /** The 5-digit counter is bounded: past it, move on by a millisecond (still monotonic). */
  private normalise(): void {
    if (this.counter > MAX_COUNTER) {
      this.wall += 1;
      this.counter = 0;
    }
  }
}
