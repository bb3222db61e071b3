import * as z from 'zod';

import { CIRCLE_COLLECTIONS } from '../circles/circle-collections';
import { COLLECTIONS } from '../sync/schema/collections';
import type { FieldSpec } from '../sync/schema/field';
import { BOOK_REFERENCES, movedBookIds, referenceMoves } from './book-references';

const FROM = '00000000-0000-4000-8000-00000000f001';
const TO = '00000000-0000-4000-8000-00000000f002';
const ELSE = '00000000-0000-4000-8000-00000000f003';

/** A name that says "a book's id" (bookId, bestBookId, bookLinks), unlike notebookId or ebookLocation. */
const SAYS_BOOK = /(^book|Book)[A-Z]/;

/** Property names anywhere in a JSON Schema (zod 4's own output for the field's validator). */
function propertyNames(schema: unknown): string[] {
  if (schema === null || typeof schema !== 'object') return [];
  const here = Object.entries(schema as Record<string, unknown>);
  const own = here.flatMap(([key, value]) => (key === 'properties' && value && typeof value === 'object' ? Object.keys(value) : []));
  return [...own, ...here.flatMap(([, value]) => propertyNames(value))];
}

/** Every field of the schema that looks like it holds a book id, by its name or its JSON's property names. */
function fieldsThatLookLikeBookIds(): string[] {
  const all = { ...COLLECTIONS, ...CIRCLE_COLLECTIONS } as Record<string, { fields: Record<string, FieldSpec> }>;
  return Object.entries(all).flatMap(([collection, { fields }]) =>
    Object.entries(fields)
      .filter(
        ([name, spec]) =>
          SAYS_BOOK.test(name) ||
          (spec.sqlType === 'jsonb' && propertyNames(z.toJSONSchema(spec.schema, { unrepresentable: 'any' })).some((property) => SAYS_BOOK.test(property))),
      )
      .map(([name]) => `${collection}.${name}`),
  );
}

describe('book references', () => {
  it('lists every field of the schema that holds a book id (a new one must be declared with optionalBookRef or json(…, bookIds))', () => {
    const declared = BOOK_REFERENCES.map(({ collection, field }) => `${collection}.${field}`).sort();
    expect(declared).toEqual(fieldsThatLookLikeBookIds().sort());
    // The ones this issue names, so the guard above cannot pass by finding nothing.
    expect(declared).toEqual(
      jasmine.arrayContaining([
        'readings.bookId',
        'sessions.bookId',
        'quotes.bookId',
        'bookStatusChanges.bookId',
        'yearPlans.bestBookId',
        'yearPlans.otherGoals',
        'monthPlans.favouriteBookId',
        'monthPlans.leastFavouriteBookId',
        'monthPicks.bookId',
        'challenges.prompts',
        'loans.bookId',
        'circleProgress.bookLinks',
        'notebooks.bookId',
        'favourites.bookId',
        'timers.bookId',
      ]),
    );
  });

  it('moves a book id held as the value, in list entries and as record values, and nothing else', () => {
    expect(movedBookIds(FROM, 'value', FROM, TO)).toBe(TO);
    expect(movedBookIds(ELSE, 'value', FROM, TO)).toBeUndefined();
    expect(
      movedBookIds(
        [
          { id: 'a', text: 'x', bookId: FROM },
          { id: 'b', text: 'y', bookId: ELSE },
          { id: 'c', text: 'z' },
        ],
        'entries',
        FROM,
        TO,
      ),
    ).toEqual([
      { id: 'a', text: 'x', bookId: TO },
      { id: 'b', text: 'y', bookId: ELSE },
      { id: 'c', text: 'z' },
    ]);
    expect(movedBookIds([{ id: 'b', text: 'y', bookId: ELSE }], 'entries', FROM, TO)).toBeUndefined();
    expect(movedBookIds({ [ELSE]: FROM, [FROM]: ELSE }, 'values', FROM, TO)).toEqual({ [ELSE]: TO, [FROM]: ELSE });
    expect(movedBookIds(null, 'values', FROM, TO)).toBeUndefined();
  });

  it('gives one write for every row of every referencing collection that names the book, each valid for its field', () => {
    const sample = (holds: string) => (holds === 'value' ? FROM : holds === 'entries' ? [{ id: 'p1', text: 'A prompt', bookId: FROM }] : { [ELSE]: FROM });
    const rows: Record<string, Record<string, unknown>[]> = {};
    BOOK_REFERENCES.forEach(({ collection, field, holds }, n) => {
      (rows[collection] ??= []).push({ id: `row-${n}`, [field]: sample(holds) }, { id: `untouched-${n}`, [field]: null });
    });
    const moves = referenceMoves(rows, FROM, TO);
    expect(moves.length).toBe(BOOK_REFERENCES.length);
    for (const move of moves) {
      const all = { ...COLLECTIONS, ...CIRCLE_COLLECTIONS } as Record<string, { fields: Record<string, FieldSpec> }>;
      for (const [field, value] of Object.entries(move.patch)) {
        expect(JSON.stringify(value)).withContext(`${move.collection}.${field}`).toContain(TO);
        expect(JSON.stringify(value)).not.toContain(FROM);
        expect(all[move.collection]!.fields[field]!.schema.safeParse(value).success).withContext(`${move.collection}.${field} stays valid`).toBeTrue();
      }
    }
  });
});
