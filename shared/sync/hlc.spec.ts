import fc from 'fast-check';

import { ClockAheadError, formatHlc, HlcClock, MAX_CLOCK_AHEAD_MS, parseHlc } from './hlc';
import { expectProperty } from '../testing/expect-property';

/** A settable physical clock. */
function physical(start: number) {
  let now = start;
  return { now: () => now, set: (value: number) => (now = value) };
}

describe('HLC (Kulkarni et al. 2014, "Logical Physical Clocks")', () => {
  it('writes <wall ms, 15 digits>:<counter, 5 digits>:<node> and reads it back', () => {
    const text = formatHlc({ wall: 1764633600000, counter: 7, node: 'tablet-1' });
    expect(text).toBe('001764633600000:00007:tablet-1');
    expect(parseHlc(text)).toEqual({ wall: 1764633600000, counter: 7, node: 'tablet-1' });
    expect(parseHlc('1764633600000:7:tablet-1')).toBeNull();
  });

  it('send/local event: l = max(l, pt); c = 0 when pt moved l on, c + 1 otherwise (paper, Fig. 5)', () => {
    const pt = physical(1000);
    const clock = new HlcClock('a', pt.now);

    expect(clock.tick()).toBe(formatHlc({ wall: 1000, counter: 0, node: 'a' }));
    expect(clock.tick()).toBe(formatHlc({ wall: 1000, counter: 1, node: 'a' })); // same pt: counter
    pt.set(900); // the physical clock stepped back: l keeps its value
    expect(clock.tick()).toBe(formatHlc({ wall: 1000, counter: 2, node: 'a' }));
    pt.set(1005);
    expect(clock.tick()).toBe(formatHlc({ wall: 1005, counter: 0, node: 'a' }));
  });

  it('receive: the four cases of the paper’s receive rule', () => {
    const pt = physical(1000);
    // l == l' == lm → c = max(c, cm) + 1
    const a = new HlcClock('a', pt.now, formatHlc({ wall: 2000, counter: 3, node: 'a' }));
    a.receive(formatHlc({ wall: 2000, counter: 8, node: 'b' }));
    expect(a.current()).toBe(formatHlc({ wall: 2000, counter: 9, node: 'a' }));
    // l == l' (ours is ahead) → c + 1
    const b = new HlcClock('b', pt.now, formatHlc({ wall: 2000, counter: 3, node: 'b' }));
    b.receive(formatHlc({ wall: 1500, counter: 8, node: 'a' }));
    expect(b.current()).toBe(formatHlc({ wall: 2000, counter: 4, node: 'b' }));
    // l == lm (remote is ahead) → cm + 1
    const c = new HlcClock('c', pt.now, formatHlc({ wall: 1200, counter: 3, node: 'c' }));
    c.receive(formatHlc({ wall: 3000, counter: 8, node: 'a' }));
    expect(c.current()).toBe(formatHlc({ wall: 3000, counter: 9, node: 'c' }));
    // pt is ahead of both → c = 0
    pt.set(5000);
    const d = new HlcClock('d', pt.now, formatHlc({ wall: 1200, counter: 3, node: 'd' }));
    d.receive(formatHlc({ wall: 3000, counter: 8, node: 'a' }));
    expect(d.current()).toBe(formatHlc({ wall: 5000, counter: 0, node: 'd' }));
  });

  it('never adopts a remote clock more than 24 hours ahead of its own wall clock', () => {
    const pt = physical(1_000_000);
    const clock = new HlcClock('a', pt.now);
    const before = clock.tick();

    expect(() => clock.receive(formatHlc({ wall: 1_000_000 + MAX_CLOCK_AHEAD_MS + 1, counter: 0, node: 'z' }))).toThrowError(ClockAheadError);
    expect(clock.current()).toBe(before);
    clock.receive(formatHlc({ wall: 1_000_000 + MAX_CLOCK_AHEAD_MS, counter: 0, node: 'z' })); // exactly 24 h is allowed
    expect(parseHlc(clock.current())?.wall).toBe(1_000_000 + MAX_CLOCK_AHEAD_MS);
  });

  it('adopts a clock the server already checked however far ahead it looks, so the next event orders after it', () => {
    const pt = physical(1_000_000);
    const clock = new HlcClock('a', pt.now);
    const far = formatHlc({ wall: 1_000_000 + 3 * MAX_CLOCK_AHEAD_MS, counter: 4, node: 'z' });

    clock.receive(far, { checkedByServer: true });
    expect(clock.tick() > far).toBeTrue();
  });

  it('orders by wall time, then counter, where unpadded numbers would sort the other way', () => {
    // Hand-worked: as plain text '9' > '10', so only the fixed widths make 9 ms come first.
    expect(formatHlc({ wall: 9, counter: 0, node: 'b' }) < formatHlc({ wall: 10, counter: 0, node: 'a' })).toBeTrue();
    expect(formatHlc({ wall: 10, counter: 9, node: 'b' }) < formatHlc({ wall: 10, counter: 10, node: 'a' })).toBeTrue();
    expect(formatHlc({ wall: 10, counter: 0, node: 'z' })).toBe('000000000000010:00000:z');
  });

  it('string order equals (wall, counter, node) order for any clocks (property)', () => {
    const hlc = fc.record({
      wall: fc.integer({ min: 0, max: 10 ** 15 - 1 }),
      counter: fc.integer({ min: 0, max: 99_999 }),
      node: fc.stringMatching(/^[a-z0-9-]{1,12}$/),
    });
    expectProperty(
      fc.property(hlc, hlc, (x, y) => {
        const tupleOrder = x.wall - y.wall || x.counter - y.counter || (x.node < y.node ? -1 : x.node > y.node ? 1 : 0);
        const textOrder = formatHlc(x) < formatHlc(y) ? -1 : formatHlc(x) > formatHlc(y) ? 1 : 0;
        return Math.sign(tupleOrder) === textOrder;
      }),
    );
  });

  it('every event is later than the previous one and than every clock received (property)', () => {
    // Paper, Theorem 1: e hb f ⇒ l.e, c.e < l.f, c.f — checked over random steps and clock jumps.
    const step = fc.oneof(
      fc.record({ kind: fc.constant('tick' as const), pt: fc.integer({ min: 0, max: 10_000 }) }),
      fc.record({
        kind: fc.constant('receive' as const),
        pt: fc.integer({ min: 0, max: 10_000 }),
        wall: fc.integer({ min: 0, max: 10_000 }),
        counter: fc.integer({ min: 0, max: 99_999 }),
      }),
    );
    expectProperty(
      fc.property(fc.array(step, { maxLength: 60 }), (steps) => {
        const pt = physical(0);
        const clock = new HlcClock('node-a', pt.now);
        let last = clock.current();
        for (const s of steps) {
          pt.set(s.pt);
          if (s.kind === 'tick') {
            const next = clock.tick();
            if (!(next > last)) return false;
            last = next;
          } else {
            const remote = formatHlc({ wall: s.wall, counter: s.counter, node: 'node-b' });
            clock.receive(remote);
            const next = clock.current();
            if (!(next > last) || !(parseHlc(next)!.wall >= s.wall) || !(clock.tick() > remote)) return false;
            last = clock.current();
          }
        }
        return true;
      }),
    );
  });

  it('keeps counting when the counter would pass 5 digits by moving on a millisecond', () => {
    const clock = new HlcClock('a', () => 10, formatHlc({ wall: 10, counter: 99_999, node: 'a' }));
    const next = clock.tick();
    expect(next).toBe(formatHlc({ wall: 11, counter: 0, node: 'a' }));
  });
});
