import fc from 'fast-check';

import { appendPage, byPosition, MAX_POSITION, MIN_POSITION_GAP, movePage, placeAt, positionBetween, renumber, type Positioned } from './page-order';
import { expectProperty } from '../testing/expect-property';

/** Applies position writes to pages. */
const apply = (pages: readonly Positioned[], writes: readonly { id: string; position: number }[]) => {
  const next = new Map(pages.map((page) => [page.id, page]));
  for (const write of writes) next.set(write.id, { id: write.id, position: write.position });
  return byPosition([...next.values()]);
};
const ids = (pages: readonly Positioned[]) => pages.map((page) => page.id);

describe('page order', () => {
  describe('positionBetween', () => {
    it('takes the midpoint, steps past a single neighbour, and starts at 0', () => {
      expect(positionBetween(1, 2)).toBe(1.5);
      expect(positionBetween(-3, 5)).toBe(1);
      expect(positionBetween(4)).toBe(5);
      expect(positionBetween(undefined, 0)).toBe(-1);
      expect(positionBetween(null, null)).toBe(0);
      expect(positionBetween()).toBe(0);
    });

    it('refuses when there is no room, so the caller renumbers', () => {
      expect(() => positionBetween(2, 2)).toThrowError(RangeError);
      expect(() => positionBetween(3, 2)).toThrowError(RangeError);
      expect(() => positionBetween(1, 1 + MIN_POSITION_GAP / 2)).toThrowError(RangeError);
      expect(() => positionBetween(MAX_POSITION)).toThrowError(RangeError);
      expect(() => positionBetween(undefined, -MAX_POSITION)).toThrowError(RangeError);
      expect(() => positionBetween(Number.NaN, 1)).toThrowError(RangeError);
    });

    it('gives a result strictly between any two positions in range with room between them (property)', () => {
      const position = fc.double({ min: -MAX_POSITION, max: MAX_POSITION, noNaN: true });
      expectProperty(
        fc.property(position, position, (x, y) => {
          const [before, after] = x < y ? [x, y] : [y, x];
          fc.pre(after - before >= MIN_POSITION_GAP);
          const between = positionBetween(before, after);
          expect(between > before && between < after)
            .withContext(`${before} < ${between} < ${after}`)
            .toBeTrue();
        }),
      );
    });

    it('still splits the smallest allowed gap at the edges of the range, where doubles are sparsest', () => {
      for (const before of [MAX_POSITION - 1, -MAX_POSITION, 536_870_912.5, -0.000_001]) {
        // The nearest double at least the gap away (before + gap may round to slightly less).
        let after = before + MIN_POSITION_GAP;
        while (after - before < MIN_POSITION_GAP) after += Math.max(Math.abs(after) * Number.EPSILON, Number.MIN_VALUE);
        const between = positionBetween(before, after);
        expect(between > before && between < after)
          .withContext(`${before} < ${between} < ${after}`)
          .toBeTrue();
      }
    });
  });

  it('orders pages by position, equal positions by id, pages without a position last', () => {
    const pages = [
      { id: 'c', position: 1 },
      { id: 'x', position: null },
      { id: 'b', position: 1 },
      { id: 'a', position: 2 },
      { id: 'w' },
      { id: 'd', position: -4 },
    ];
    expect(ids(byPosition(pages))).toEqual(['d', 'b', 'c', 'a', 'w', 'x']);
  });

  it('renumbers to 0, 1, 2, … writing only the pages that change', () => {
    expect(renumber([{ id: 'a', position: 0 }, { id: 'b', position: 0.5 }, { id: 'c', position: 2 }, { id: 'd' }])).toEqual([
      { id: 'b', position: 1 },
      { id: 'd', position: 3 },
    ]);
  });

  it('moves one page with one write, and nothing past the ends', () => {
    const pages = [
      { id: 'a', position: 0 },
      { id: 'b', position: 1 },
      { id: 'c', position: 2 },
    ];
    expect(movePage(pages, 'a', 1)).toEqual([{ id: 'a', position: 1.5 }]);
    expect(movePage(pages, 'c', -1)).toEqual([{ id: 'c', position: 0.5 }]);
    expect(movePage(pages, 'b', -1)).toEqual([{ id: 'b', position: -1 }]);
    expect(movePage(pages, 'b', 1)).toEqual([{ id: 'b', position: 3 }]);
    expect(movePage(pages, 'a', -1)).toEqual([]);
    expect(movePage(pages, 'c', 1)).toEqual([]);
    expect(appendPage(pages, 'n')).toEqual([{ id: 'n', position: 3 }]);
    expect(appendPage([], 'n')).toEqual([{ id: 'n', position: 0 }]);
  });

  it('renumbers when two pages share a position (two devices inserted at one spot) or have none', () => {
    const tied = byPosition([
      { id: 'a', position: 0 },
      { id: 'b', position: 1 },
      { id: 'c', position: 1 },
    ]);
    expect(apply(tied, placeAt(tied, 'n', 2)).map((p) => p.id)).toEqual(['a', 'b', 'n', 'c']);
    const unplaced = [{ id: 'a', position: 0 }, { id: 'b' }];
    expect(apply(unplaced, placeAt(unplaced, 'n', 1)).map((p) => p.id)).toEqual(['a', 'n', 'b']);
  });

  it('keeps every insert and move where it was asked, however many, renumbering when gaps get tiny (property)', () => {
    const step = fc.record({ kind: fc.constantFrom('insert', 'move'), at: fc.nat(), by: fc.constantFrom(-1 as const, 1 as const) });
    expectProperty(
      fc.property(fc.array(step, { minLength: 1, maxLength: 120 }), (steps) => {
        let pages: Positioned[] = [];
        let expected: string[] = [];
        steps.forEach((s, n) => {
          if (s.kind === 'insert' || pages.length === 0) {
            const id = `p${n}`;
            const at = s.at % (pages.length + 1);
            pages = apply(pages, placeAt(pages, id, at));
            expected.splice(at, 0, id);
          } else {
            const from = s.at % pages.length;
            const id = expected[from]!;
            pages = apply(pages, movePage(pages, id, s.by));
            const to = from + s.by;
            if (to >= 0 && to < expected.length) expected = Object.assign([...expected], { [from]: expected[to], [to]: id });
          }
          expect(ids(pages)).toEqual(expected);
          const positions = pages.map((page) => page.position!);
          expect(positions.every((p, i) => i === 0 || p > positions[i - 1]!)).toBeTrue();
          expect(positions.every((p) => Math.abs(p) <= MAX_POSITION)).toBeTrue();
        });
      }),
    );
  });

  it('survives inserting at the same spot many times (the precision limit), by renumbering', () => {
    let pages: Positioned[] = [
      { id: 'first', position: 0 },
      { id: 'last', position: 1 },
    ];
    let renumbered = 0;
    for (let n = 0; n < 200; n++) {
      const writes = placeAt(pages, `p${n}`, 1);
      if (writes.length > 1) renumbered++;
      pages = apply(pages, writes);
      expect(pages[1]!.id).toBe(`p${n}`);
      expect(pages.at(-1)!.id).toBe('last');
    }
    expect(renumbered).toBeGreaterThan(0);
    expect(renumbered).toBeLessThan(20); // after a renumber there is room again
  });
});
