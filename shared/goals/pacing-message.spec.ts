import fc from 'fast-check';
import { goalPacing } from './goal-pacing';
import { GOAL_UNITS } from './goal-unit';
import { pacingMessage } from './pacing-message';
import { expectProperty } from '../testing/expect-property';

describe('pacingMessage', () => {
  // The figures are hand-worked in goal-pacing.spec.ts; the wording is ours.
  const july = (target: number, actual: number) => goalPacing({ target, actual, year: 2026, today: '2026-07-01' });

  it('says how far past the even-pace marker the reader is', () => {
    // Hand: 29 − 25.786 = 3.214 → "3.2".
    expect(pacingMessage(july(52, 29), 'books')).toBe('3.2 books past the even-pace marker');
  });

  it('says what a week would take when there is ground to make up', () => {
    // Hand: 32 left over 184 days = 32 × 7 / 184 = 1.217 a week → "1.2".
    expect(pacingMessage(july(52, 20), 'books')).toBe('About 1.2 books a week from now gets you there');
  });

  it('says so when the pace is even', () => {
    expect(pacingMessage(july(52, 26), 'books')).toBe('Right on an even pace for 52 books');
  });

  it('uses the singular for exactly one', () => {
    // Hand: 52 books, 2026-01-01, 0 read: 52 / (365 / 7) = 0.997 a week → "1" book.
    const day1 = goalPacing({ target: 52, actual: 0, year: 2026, today: '2026-01-01' });
    expect(pacingMessage({ ...day1, status: 'behind' }, 'books')).toBe('About 1 book a week from now gets you there');
  });

  it('writes pages and minutes as whole numbers', () => {
    // Hand: 10 000 pages, 2026-07-01, 4 000 read: 6 000 × 7 / 184 = 228.26 a week.
    expect(pacingMessage(july(10_000, 4_000), 'pages')).toBe('About 228 pages a week from now gets you there');
    // Hand: 6 000 minutes, 3 500 read: expected 2 975.3, so 524.7 ahead.
    expect(pacingMessage(july(6_000, 3_500), 'minutes')).toBe('525 minutes past the even-pace marker');
  });

  it('counts down in the last week instead of giving a weekly rate', () => {
    expect(pacingMessage(goalPacing({ target: 52, actual: 49, year: 2026, today: '2026-12-29' }), 'books')).toBe('3 books to go for the year');
  });

  it('marks a goal reached, and closes a finished year without judgement', () => {
    expect(pacingMessage(july(52, 52), 'books')).toBe('Goal of 52 books reached');
    expect(pacingMessage(goalPacing({ target: 52, actual: 40, year: 2026, today: '2027-01-02' }), 'books')).toBe('The year closed at 40 of 52 books');
  });

  it('never scolds, whatever the numbers', () => {
    // Common practice in product writing (e.g. Mailchimp's Content Style Guide, from memory:
    // exclamation points sparingly, never to alarm); the words ruled out are our own choice.
    const scolding = /!|\b(behind|fail|failed|only|should|must|missed|late|hurry|need to)\b/i;
    expectProperty(
      fc.property(
        fc.integer({ min: 1, max: 20_000 }),
        fc.integer({ min: 0, max: 20_000 }),
        fc.integer({ min: -5, max: 370 }),
        fc.constantFrom(...GOAL_UNITS),
        (target, actual, offset, unit) => {
          const today = new Date(Date.UTC(2026, 0, 1 + offset)).toISOString().slice(0, 10);
          const message = pacingMessage(goalPacing({ target, actual, year: 2026, today }), unit);
          expect(message).not.toMatch(scolding);
          expect(message).not.toContain('\n');
          expect(message.length).toBeGreaterThan(0);
        },
      ),
    );
  });
});
