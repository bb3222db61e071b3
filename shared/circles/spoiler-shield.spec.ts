import fc from 'fast-check';

import { expectProperty } from '../testing/expect-property';
import type { SchedulePart } from './schedule';
import { isPostShielded, partsPassed, readingPassed, type ReadingPosition, type ShieldContext } from './spoiler-shield';

const part = (id: string, position: number, endKind: SchedulePart['endKind'], endValue: string): SchedulePart => ({ id, position, endKind, endValue });
const parts = [part('p1', 1, 'page', '100'), part('p2', 2, 'percent', '60'), part('p3', 3, 'chapter', 'Epilogue')];
const context = (position: ReadingPosition, past: string[] = [], revealed: string[] = []): ShieldContext => ({
  parts,
  pick: { pageCount: 300, audioMinutes: 600 },
  position,
  pastPartIds: new Set(past),
  revealedPartIds: new Set(revealed),
});
const about = (partId: string | null, mine = false) => ({ partId, mine });

describe('spoiler shield', () => {
  it('shields a post about a part the reader has not finished', () => {
    expect(isPostShielded(about('p2'), context({ unit: 'page', value: 120 }))).toBeTrue();
    expect(isPostShielded(about('p1'), context({ unit: 'page', value: 120 }))).toBeFalse();
    expect(isPostShielded(about('p1'), context(null))).toBeTrue();
  });

  it('measures progress in the reader’s own unit against the part’s end', () => {
    // 180 of 300 pages is 60 %, the end of part 2; 360 of 600 minutes likewise.
    expect(readingPassed(parts[1]!, context({ unit: 'page', value: 180 }))).toBeTrue();
    expect(readingPassed(parts[1]!, context({ unit: 'minute', value: 359 }))).toBeFalse();
    expect(readingPassed(parts[1]!, context({ unit: 'minute', value: 360 }))).toBeTrue();
    expect(readingPassed(parts[0]!, context({ unit: 'percent', value: 34 }))).toBeTrue();
    // A chapter label cannot be measured: only "I'm past this part" passes it.
    expect(readingPassed(parts[2]!, context({ unit: 'percent', value: 100 }))).toBeFalse();
  });

  it('treats "I’m past this part" as past the parts before it too', () => {
    expect([...partsPassed(context(null, ['p2']))].sort()).toEqual(['p1', 'p2']);
    expect(isPostShielded(about('p3'), context(null, ['p2']))).toBeTrue();
  });

  it('shows the reader’s own posts, general posts and posts about parts no longer scheduled', () => {
    expect(isPostShielded(about('p3', true), context(null))).toBeFalse();
    expect(isPostShielded(about(null), context(null))).toBeFalse();
    expect(isPostShielded(about('gone'), context(null))).toBeFalse();
  });

  const ids = ['p1', 'p2', 'p3'];
  const arbContext = fc.record({
    position: fc.option(fc.record({ unit: fc.constantFrom('page' as const, 'percent' as const, 'minute' as const), value: fc.integer({ min: 0, max: 600 }) }), {
      nil: null,
    }),
    past: fc.subarray(ids),
    revealed: fc.subarray(ids),
  });

  it('never shows a post beyond the reader’s progress unless they revealed that part (property)', () => {
    expectProperty(
      fc.property(arbContext, fc.constantFrom(...ids), ({ position, past, revealed }, partId) => {
        const ctx = context(position, past, revealed);
        const index = ids.indexOf(partId);
        const reachedByReading = readingPassed(parts[index]!, ctx);
        const reachedByWord = past.some((id) => ids.indexOf(id) >= index);
        const shown = !isPostShielded(about(partId), ctx);
        return !shown || reachedByReading || reachedByWord || revealed.includes(partId);
      }),
    );
  });

  it('revealing one part changes nothing about any other part (property)', () => {
    expectProperty(
      fc.property(arbContext, fc.constantFrom(...ids), fc.constantFrom(...ids), ({ position, past, revealed }, revealedNow, other) => {
        fc.pre(revealedNow !== other);
        const before = isPostShielded(about(other), context(position, past, revealed));
        const after = isPostShielded(about(other), context(position, past, [...revealed, revealedNow]));
        return before === after;
      }),
    );
  });

  it('reading further never shields a post that was shown (property)', () => {
    expectProperty(
      fc.property(arbContext, fc.integer({ min: 0, max: 300 }), fc.constantFrom(...ids), ({ position, past, revealed }, more, partId) => {
        fc.pre(position !== null);
        const further = { unit: position!.unit, value: position!.value + more };
        const shownBefore = !isPostShielded(about(partId), context(position, past, revealed));
        const shownAfter = !isPostShielded(about(partId), context(further, past, revealed));
        return !shownBefore || shownAfter;
      }),
    );
  });
});
