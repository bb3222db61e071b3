import { finishBeforeDueSentence, type FinishBeforeDueInput } from './finish-before-due-sentence';
import { BRIEF_EXAMPLE } from '../reading/testing/brief-example';

/** 300 pages at 30 pages an hour (600 minutes), 45 minutes a day, from 1 March 2026. */
const sentence = (changes: Partial<FinishBeforeDueInput>) =>
  finishBeforeDueSentence({
    ...BRIEF_EXAMPLE,
    timeZone: 'Europe/London',
    dueOn: '2026-03-16',
    ...changes,
  });

describe('finishBeforeDueSentence', () => {
  it('says when the reader finishes and how many days early', () => {
    // Hand-worked: 600 / 45 = 13.3 → 14 reading days from 1 March → 14 March, two days before the 16th.
    expect(sentence({})).toBe('At your pace you finish around 14 March — 2 days before it is due.');
    expect(sentence({ dueOn: '2026-03-15' })).toBe('At your pace you finish around 14 March — 1 day before it is due.');
    expect(sentence({ dueOn: '2026-03-14' })).toBe('At your pace you finish around 14 March — on the day it is due.');
  });

  it("writes the finish day in the reader's locale, as Intl.DateTimeFormat orders day and month (CLDR)", () => {
    expect(sentence({ locale: 'en-US' })).toBe('At your pace you finish around March 14 — 2 days before it is due.');
    expect(sentence({ locale: 'de-DE' })).toBe('At your pace you finish around 14. März — 2 days before it is due.');
  });

  it('says how many pages short and what a day would take', () => {
    // 1–10 March is 10 days × 45 minutes × 0.5 pages a minute = 225 pages: 75 short; 300 / 10 = 30 a day.
    expect(sentence({ dueOn: '2026-03-10' })).toBe('About 75 pages short by the due date: 30 pages a day would make it.');
  });

  it("counts an audiobook in listened minutes at the reader's speed", () => {
    // 600 book minutes at 1.5× and 60 real minutes a day = 90 a day; 5 days (1–5 March) = 450: 150 short, 120 a day.
    expect(sentence({ remaining: 600, pace: { format: 'audiobook', rate: 1.5 }, minutesPerDay: 60, dueOn: '2026-03-05' })).toBe(
      'About 150 minutes short by the due date: 120 minutes a day would make it.',
    );
  });

  it('gives what a day would take without usual minutes, and nothing once the due date has passed', () => {
    expect(sentence({ minutesPerDay: 0, dueOn: '2026-03-10' })).toBe('By the due date: 30 pages a day would make it.');
    expect(sentence({ dueOn: '2026-02-28' })).toBeNull();
  });
});
