import { getISOWeek } from 'date-fns';

import { formatHlc } from '../sync/hlc';
import { ChallengeBook } from './challenge-book';
import { challengeProgress, ChallengeRow } from './challenge-progress';

// Invented books and challenges.
const library: ChallengeBook[] = [
  { id: 'orchard', title: 'The Quiet Orchard', authors: ['Ada Okafor'], status: 'finished', finishedOn: '2026-03-03' },
  { id: 'ferry', title: 'The Blue Ferry', authors: ['Kit Ashdown'], status: 'tbr' },
  { id: 'owl', title: 'An Owl at Dusk', authors: ['Noor Halvorsen'], status: 'reading' },
];
const year = { periodStart: '2026-01-01', periodEnd: '2026-12-31' };
const today = '2026-03-04';

describe('challengeProgress', () => {
  it('counts one book in every challenge it fits', () => {
    // Product rule (ours): challenges never share out books; each counts what fits it.
    const count = challengeProgress({ kind: 'count', target: 25, ...year }, { library, today });
    const byTitle = challengeProgress({ kind: 'alphabet', alphabetBy: 'title', ...year }, { library, today });
    const bySurname = challengeProgress({ kind: 'alphabet', alphabetBy: 'author-surname', ...year }, { library, today });
    // isoWeeksOfYear(2026): week 1 opens on Monday 2025-12-29, week 53 closes on Sunday 2027-01-03.
    const weekly = challengeProgress({ kind: 'weekly', periodStart: '2025-12-29', periodEnd: '2027-01-03' }, { library, today });
    const prompts = challengeProgress(
      { kind: 'prompts', ...year, prompts: [{ id: 'p1', text: 'A book set in an orchard', bookId: 'orchard' }] },
      { library, today },
    );
    for (const progress of [count, byTitle, bySurname, weekly, prompts]) expect(progress!.progress.counted).toEqual(['orchard']);

    // The alphabet rule: a leading "The" is not filed on (ALA Filing Rules, 1980, from memory), so Q, not T.
    expect(byTitle!.kind === 'alphabet' && byTitle!.progress.letters.find((entry) => entry.bookId === 'orchard')?.letter).toBe('Q');
    // By surname: the last word of 'Ada Okafor' → O.
    expect(bySurname!.kind === 'alphabet' && bySurname!.progress.letters.find((entry) => entry.bookId === 'orchard')?.letter).toBe('O');
    // Python date(2026, 3, 3).isocalendar(), run while writing: (2026, 10, 2) → week 10.
    expect(weekly!.kind === 'weekly' && weekly!.progress.weeks.find((week) => week.bookIds.includes('orchard'))?.week).toBe(10);
  });

  it('suggests TBR books for open letters, looking past their articles', () => {
    const progress = challengeProgress({ kind: 'alphabet', alphabetBy: 'title', ...year }, { library, today });
    if (progress?.kind !== 'alphabet') return fail('not an alphabet challenge');
    // 'The Blue Ferry' files under B; 'An Owl at Dusk' is being read, not TBR, so O has no suggestion.
    expect(progress.progress.suggestions['B']).toEqual(['ferry']);
    expect(progress.progress.suggestions['O']).toEqual([]);
    expect(progress.progress.suggestions['T']).toEqual([]);
  });

  it('runs a weekly challenge over the ISO year of its first Monday (53 weeks in 2026, 52 in 2027)', () => {
    // WHATWG HTML week rule: 1 January 2026 is a Thursday → 53 weeks; 2027 starts on a Friday → 52.
    const y2026 = challengeProgress({ kind: 'weekly', periodStart: '2025-12-29', periodEnd: '2027-01-03' }, { library, today });
    const y2027 = challengeProgress({ kind: 'weekly', periodStart: '2027-01-04', periodEnd: '2028-01-02' }, { library, today });
    expect(y2026!.progress.target).toBe(53);
    expect(y2027!.progress.target).toBe(52);
  });

  it('reads when a whole-year weekly challenge was made from its kind’s clock, and calls no earlier week missed', () => {
    // The clock's wall time is noon UTC on Wednesday 2 December 2026 (ISO week 49, date-fns getISOWeek).
    const made = formatHlc({ wall: Date.UTC(2026, 11, 2, 12), counter: 0, node: 'device-a' });
    const row = { kind: 'weekly' as const, periodStart: '2025-12-29', periodEnd: '2027-01-03', _hlc: { kind: made } };
    const progress = challengeProgress(row, { library: [], today: '2026-12-20' });
    if (progress?.kind !== 'weekly') return fail('not a weekly challenge');
    const stateOf = (week: number) => progress.progress.weeks.find((entry) => entry.week === week)?.state;
    expect(getISOWeek(new Date(2026, 11, 2))).toBe(49);
    expect(stateOf(1)).toBe('before');
    expect(stateOf(48)).toBe('before');
    expect(stateOf(49)).toBe('missed');
    expect(stateOf(50)).toBe('missed');
    expect(stateOf(51)).toBe('upcoming');
    // Without its clock (a row not yet complete), the old rule stands: every past week unmet is missed.
    const bare = challengeProgress({ ...row, _hlc: null }, { library: [], today: '2026-12-20' });
    expect(bare?.kind === 'weekly' && bare.progress.weeks[0].state).toBe('missed');
  });

  it('knows a prompt planned with a book not yet finished', () => {
    const progress = challengeProgress(
      {
        kind: 'prompts',
        ...year,
        prompts: [
          { id: 'p1', text: 'A bird in the title', bookId: 'owl' },
          { id: 'p2', text: 'A debut', bookId: null },
        ],
      },
      { library, today },
    );
    if (progress?.kind !== 'prompts') return fail('not a prompt challenge');
    expect(progress.progress.prompts.map((prompt) => prompt.state)).toEqual(['planned', 'open']);
  });

  it('gives null for a row that lacks what its kind needs', () => {
    const incomplete: ChallengeRow[] = [
      { kind: 'count', periodStart: '2026-01-01' },
      { kind: 'count', ...year },
      { kind: 'alphabet', periodStart: '2026-12-31', periodEnd: '2026-01-01' },
      { ...year },
    ];
    for (const row of incomplete) expect(challengeProgress(row, { library, today })).toBeNull();
  });
});
