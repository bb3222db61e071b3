import fc from 'fast-check';
import * as Y from 'yjs';

import { compactTextState, mergeTextUpdate } from './merge-text-update';
import { initialTextState } from './initial-text-state';
import { replaceText } from './replace-text';
import { EMPTY_TEXT_STATE, loadTextDoc, textOf } from './text-doc';

const NAME = 'notebookPages/00000000-0000-4000-8000-000000000001/body';

/** One step of a random run: an edit on a replica, or some updates reaching one. */
type Step =
  | { kind: 'insert'; replica: number; at: number; length: number }
  | { kind: 'delete'; replica: number; at: number; length: number }
  | { kind: 'deliver'; replica: number; picks: number[] };

const step: fc.Arbitrary<Step> = fc.oneof(
  fc.record({ kind: fc.constant('insert' as const), replica: fc.nat(2), at: fc.double({ min: 0, max: 1, noNaN: true }), length: fc.integer({ min: 1, max: 4 }) }),
  fc.record({ kind: fc.constant('delete' as const), replica: fc.nat(2), at: fc.double({ min: 0, max: 1, noNaN: true }), length: fc.integer({ min: 1, max: 3 }) }),
  fc.record({ kind: fc.constant('deliver' as const), replica: fc.nat(2), picks: fc.array(fc.nat(), { maxLength: 6 }) }),
);

/**
 * Three replicas typing unique characters (one CJK ideograph per character typed, so each can be
 * followed), with updates delivered in random orders and repeated. The reference is Yjs's own
 * promise (docs.yjs.dev, "Document Updates": updates are commutative, associative and
 * idempotent): every replica ends on one text, holding each typed character that nobody deleted,
 * once, and nothing else.
 */
function run(steps: readonly Step[], finalOrder: readonly number[]) {
  const replicas = [0, 1, 2].map((n) => {
    const doc = new Y.Doc();
    doc.clientID = n + 1;
    return doc;
  });
  const log: Uint8Array[] = [];
  replicas.forEach((doc) => doc.on('update', (update: Uint8Array, origin: unknown) => origin !== 'remote' && log.push(update)));
  const typed = new Set<string>();
  const deleted = new Set<string>();
  let next = 0x4e00;
  for (const s of steps) {
    const doc = replicas[s.replica]!;
    const text = doc.getText(NAME);
    if (s.kind === 'insert') {
      const chars = Array.from({ length: s.length }, () => String.fromCharCode(next++));
      chars.forEach((c) => typed.add(c));
      text.insert(Math.floor(s.at * (text.length + 1)) % (text.length + 1), chars.join(''));
    } else if (s.kind === 'delete' && text.length > 0) {
      const at = Math.floor(s.at * text.length) % text.length;
      const length = Math.min(s.length, text.length - at);
      for (const c of text.toString().slice(at, at + length)) deleted.add(c);
      text.delete(at, length);
    } else if (s.kind === 'deliver' && log.length > 0) {
      for (const pick of s.picks) Y.applyUpdate(doc, log[pick % log.length]!, 'remote');
    }
  }
  // Everything reaches everyone at last, in a random order, some twice.
  const all = log.slice();
  for (const doc of replicas) {
    for (const pick of finalOrder) Y.applyUpdate(doc, all[pick % Math.max(all.length, 1)] ?? EMPTY_TEXT_STATE, 'remote');
    for (const update of all) Y.applyUpdate(doc, update, 'remote');
  }
  return { texts: replicas.map((doc) => textOf(doc, NAME)), typed, deleted, log: all };
}

describe('mergeable texts (Yjs)', () => {
  it('three replicas with random edits, orders and repeats converge and keep every character typed and not deleted', () => {
    fc.assert(
      fc.property(fc.array(step, { maxLength: 60 }), fc.array(fc.nat(), { maxLength: 30 }), (steps, finalOrder) => {
        const { texts, typed, deleted } = run(steps, finalOrder);
        expect(new Set(texts).size).toBe(1);
        const expected = [...typed].filter((c) => !deleted.has(c)).sort();
        expect([...texts[0]!].sort()).toEqual(expected);
      }),
      { numRuns: 150 },
    );
  });

  it('the server path (merge updates in any order, repeated, then compact) shows the same text as a replica', () => {
    fc.assert(
      fc.property(fc.array(step, { maxLength: 40 }), fc.array(fc.nat(), { maxLength: 20 }), (steps, extra) => {
        const { texts, log } = run(steps, []);
        // Y.mergeUpdates accepts updates in any order (Yjs docs, "Document Updates").
        const shuffled = [...log, ...extra.map((pick) => log[pick % Math.max(log.length, 1)] ?? EMPTY_TEXT_STATE)].reverse();
        const merged = Y.mergeUpdates(shuffled.length ? shuffled : [EMPTY_TEXT_STATE]);
        const compacted = compactTextState(merged);
        expect(textOf(loadTextDoc([merged]), NAME)).toBe(texts[0]!);
        expect(textOf(loadTextDoc([compacted]), NAME)).toBe(texts[0]!);
        expect(compacted.length).toBeLessThanOrEqual(merged.length);
      }),
      { numRuns: 80 },
    );
  });

  it('two devices typing at the same place keep both insertions, in the same order on both', () => {
    const base = initialTextState(NAME, 'The end.');
    const [a, b] = [loadTextDoc([base]), loadTextDoc([base])];
    a.getText(NAME).insert(4, 'happy ');
    b.getText(NAME).insert(4, 'quiet ');
    const [ua, ub] = [Y.encodeStateAsUpdate(a), Y.encodeStateAsUpdate(b)];
    Y.applyUpdate(a, ub);
    Y.applyUpdate(b, ua);
    expect(textOf(a, NAME)).toBe(textOf(b, NAME));
    expect(['The happy quiet end.', 'The quiet happy end.']).toContain(textOf(a, NAME));
  });
});

describe('initialTextState', () => {
  it('gives the same bytes for the same text, so two devices migrating one page do not double it', () => {
    const [a, b] = [loadTextDoc([initialTextState(NAME, 'Notes on chapter one')]), loadTextDoc([initialTextState(NAME, 'Notes on chapter one')])];
    a.getText(NAME).insert(0, 'A: ');
    b.getText(NAME).insert(20, ' (B)');
    Y.applyUpdate(a, Y.encodeStateAsUpdate(b));
    expect(textOf(a, NAME)).toBe('A: Notes on chapter one (B)');
  });

  it('keeps both when two devices migrated different texts, rather than mixing them', () => {
    const doc = loadTextDoc([initialTextState(NAME, 'first'), initialTextState(NAME, 'second')]);
    expect(['firstsecond', 'secondfirst']).toContain(textOf(doc, NAME));
  });

  it('is the same for the same text of another field only when the name matches', () => {
    expect(initialTextState(NAME, 'x')).toEqual(initialTextState(NAME, 'x'));
    expect(initialTextState(`${NAME}2`, 'x')).not.toEqual(initialTextState(NAME, 'x'));
  });
});

describe('replaceText', () => {
  it('makes the Yjs text equal to any new text, surrogate pairs included', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'grapheme', maxLength: 30 }), fc.string({ unit: 'grapheme', maxLength: 30 }), (from, to) => {
        const doc = loadTextDoc([initialTextState(NAME, from)]);
        replaceText(doc.getText(NAME), to);
        expect(textOf(doc, NAME)).toBe(to);
      }),
    );
  });

  it("keeps another device's edit elsewhere in the text", () => {
    const base = initialTextState(NAME, 'alpha beta gamma');
    const [a, b] = [loadTextDoc([base]), loadTextDoc([base])];
    replaceText(a.getText(NAME), 'ALPHA beta gamma');
    replaceText(b.getText(NAME), 'alpha beta gamma delta');
    Y.applyUpdate(a, Y.encodeStateAsUpdate(b));
    expect(textOf(a, NAME)).toBe('ALPHA beta gamma delta');
  });
});

describe('mergeTextUpdate', () => {
  const stored = initialTextState(NAME, 'Stored words');
  const editOf = (name: string, edit: (text: Y.Text) => void, base = stored) => {
    const doc = loadTextDoc([base]);
    const vector = Y.encodeStateVector(doc);
    edit(doc.getText(name));
    return Y.encodeStateAsUpdate(doc, vector);
  };
  /** The stored text merged with an update that inserts `text` at `at`, within `maxLength` characters. */
  const mergeInsert = (at: number, text: string, maxLength = 100) =>
    mergeTextUpdate(
      NAME,
      stored,
      editOf(NAME, (t) => t.insert(at, text)),
      maxLength,
    );

  it('merges a good update and reports the new text', () => {
    const result = mergeInsert(12, '!');
    expect(result).toEqual(jasmine.objectContaining({ ok: true, text: 'Stored words!', changed: true }));
  });

  it('finds nothing new in an update sent twice', () => {
    const update = editOf(NAME, (t) => t.insert(0, '> '));
    const first = mergeTextUpdate(NAME, stored, update, 100);
    if (!first.ok) fail(first.reason);
    else expect(mergeTextUpdate(NAME, first.state, update, 100)).toEqual(jasmine.objectContaining({ ok: true, changed: false }));
  });

  it('refuses bytes that are not an update', () => {
    expect(mergeTextUpdate(NAME, stored, new Uint8Array([9, 9, 9, 200]), 100)).toEqual({ ok: false, reason: jasmine.stringContaining('not a Yjs update') });
  });

  it('refuses an update made for another text', () => {
    const other = editOf('notebookPages/00000000-0000-4000-8000-000000000002/body', (t) => t.insert(0, 'x'));
    expect(mergeTextUpdate(NAME, stored, other, 100)).toEqual({ ok: false, reason: 'belongs to another text' });
  });

  it('refuses an update that builds on characters the stored text lacks', () => {
    const elsewhere = initialTextState(NAME, 'Some other history');
    const update = editOf(NAME, (t) => t.insert(4, '!'), elsewhere);
    expect(mergeTextUpdate(NAME, stored, update, 100)).toEqual({ ok: false, reason: jasmine.stringContaining('builds on characters') });
  });

  it('refuses a NUL (PostgreSQL text cannot hold one) and never stores a lone surrogate', () => {
    expect(mergeInsert(0, 'a\u0000b')).toEqual({ ok: false, reason: jasmine.stringContaining('NUL') });
    // A lone surrogate cannot even travel: Yjs writes strings as UTF-8, which turns it into U+FFFD
    // (WHATWG Encoding Standard, UTF-8 encoder via TextEncoder).
    expect(mergeInsert(0, 'x\ud800y')).toEqual(jasmine.objectContaining({ ok: true, text: 'x\ufffdyStored words' }));
    expect(mergeInsert(0, '\ud83d\udcd6')).toEqual(jasmine.objectContaining({ ok: true }));
  });

  it('refuses anything but plain text', () => {
    const update = editOf(NAME, (t) => t.insertEmbed(0, { image: 'x' }));
    expect(mergeTextUpdate(NAME, stored, update, 100)).toEqual({ ok: false, reason: 'may only insert plain text' });
  });

  it('refuses an update that makes the text longer than the field allows', () => {
    expect(mergeInsert(0, 'abc', 14)).toEqual({
      ok: false,
      reason: 'would make the text longer than 14 characters',
    });
  });
});
