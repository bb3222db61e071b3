import fc from 'fast-check';

import type { PulledChange } from '../api/sync';
import { formatHlc } from './hlc';
import { mergeField } from './merge';
import { mergeChanges, type FieldState } from './merge-changes';
import { expectProperty } from '../testing/expect-property';

/** Random changes over a small space of rows and fields, so they collide often. */
const changeArb: fc.Arbitrary<PulledChange> = fc.record({
  collection: fc.constantFrom('books', 'quotes'),
  rowId: fc.constantFrom('r1', 'r2', 'r3'),
  field: fc.constantFrom('title', 'rating', 'deleted'),
  value: fc.oneof(fc.string({ maxLength: 5 }), fc.integer(), fc.boolean(), fc.constant(null)),
  hlc: fc.record({ wall: fc.integer({ min: 0, max: 20 }), counter: fc.integer({ min: 0, max: 3 }), node: fc.constantFrom('a', 'b', 'c') }).map(formatHlc),
});

/**
 * Real clocks are unique per write: one (node, wall, counter) stamps one event. Keep one change
 * per (field, clock), as a device would produce.
 */
const changesArb = fc.uniqueArray(changeArb, {
  selector: (c) => `${c.collection}/${c.rowId}/${c.field}/${c.hlc}`,
  maxLength: 40,
});

const asObject = (state: FieldState) => Object.fromEntries([...state.entries()].sort(([a], [b]) => a.localeCompare(b)));
const asChanges = (state: FieldState): PulledChange[] =>
  [...state.entries()].map(([key, stamped]) => {
    const [collection, rowId, field] = key.split('/') as [string, string, string];
    return { collection, rowId, field, ...stamped };
  });
const fold = (changes: readonly PulledChange[]) => asObject(mergeChanges(new Map(), changes));

describe('Per-field last-writer-wins merge', () => {
  it('keeps the value with the greater clock, whichever arrives first', () => {
    const older = { value: 'Old title', hlc: formatHlc({ wall: 1, counter: 0, node: 'a' }) };
    const newer = { value: 'New title', hlc: formatHlc({ wall: 2, counter: 0, node: 'a' }) };
    expect(mergeField(older, newer)).toBe(newer);
    expect(mergeField(newer, older)).toBe(newer);
    expect(mergeField(undefined, older)).toBe(older);
  });

  it('is commutative: any order of the same changes gives the same state (property)', () => {
    expectProperty(
      fc.property(
        changesArb.chain((changes) => fc.tuple(fc.constant(changes), fc.shuffledSubarray(changes, { minLength: changes.length }))),
        ([changes, shuffled]) => {
          expect(fold(shuffled)).toEqual(fold(changes));
        },
      ),
    );
  });

  it('is associative: merging in batches, in any grouping, equals merging all at once (property)', () => {
    expectProperty(
      fc.property(changesArb, fc.integer({ min: 0, max: 40 }), fc.integer({ min: 0, max: 40 }), (changes, i, j) => {
        const [cut1, cut2] = [Math.min(i, j, changes.length), Math.min(Math.max(i, j), changes.length)];
        const a = changes.slice(0, cut1);
        const b = changes.slice(cut1, cut2);
        const c = changes.slice(cut2);
        // (a · b) · c
        const left = mergeChanges(mergeChanges(mergeChanges(new Map(), a), b), c);
        // a · (b · c): b and c merged into a state of their own first, then applied over a
        const right = mergeChanges(mergeChanges(new Map(), a), asChanges(mergeChanges(new Map(), [...b, ...c])));
        expect(asObject(left)).toEqual(asObject(right));
      }),
    );
  });

  it('is idempotent: duplicates and re-sent batches change nothing (property)', () => {
    expectProperty(
      fc.property(changesArb, fc.array(fc.nat(), { maxLength: 30 }), (changes, picks) => {
        const duplicated = [...changes, ...picks.filter(() => changes.length > 0).map((p) => changes[p % changes.length]!)];
        expect(fold(duplicated)).toEqual(fold(changes));
        const once = mergeChanges(new Map(), changes);
        expect(asObject(mergeChanges(once, changes))).toEqual(asObject(once));
      }),
    );
  });

  it('ends every device in one state after random interleavings of their changes (property)', () => {
    // Three devices each see all changes, in their own order and with repeats.
    expectProperty(
      fc.property(
        changesArb.chain((changes) =>
          fc.tuple(fc.constant(changes), fc.shuffledSubarray(changes, { minLength: changes.length }), fc.shuffledSubarray(changes, { minLength: changes.length })),
        ),
        ([laptop, tablet, phone]) => {
          const reference = fold(laptop);
          expect(fold(tablet)).toEqual(reference);
          expect(fold([...phone, ...phone.slice(0, 3)])).toEqual(reference);
        },
      ),
    );
  });
});
