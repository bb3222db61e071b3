import { FormControl, FormGroup } from '@angular/forms';

import { challengeFormValidator, countTarget, newChallengeFields, type ChallengeFormValue } from './challenge-form';

const base: ChallengeFormValue = {
  kind: 'count',
  name: '',
  target: '25',
  otherTarget: '',
  alphabetBy: 'title',
  periodStart: '2026-01-01',
  periodEnd: '2026-12-31',
  weekYear: '2026',
  weekFrom: 'whole-year',
  prompts: [],
};
const check = (value: ChallengeFormValue) =>
  challengeFormValidator(new FormGroup(Object.fromEntries(Object.entries(value).map(([key, v]) => [key, new FormControl(v)]))) as never);
let n = 0;
const ids = () => `id-${++n}`;

describe('the new-challenge form', () => {
  it('takes a ready-made target or the reader’s own number', () => {
    expect(countTarget(base)).toBe(25);
    expect(countTarget({ target: 'other', otherTarget: ' 7 ' })).toBe(7);
    expect(countTarget({ target: 'other', otherTarget: '2.5' })).toBeNull();
    expect(countTarget({ target: 'other', otherTarget: '0' })).toBeNull();
    expect(check({ ...base, target: 'other', otherTarget: '' })).toEqual({ target: jasmine.any(String) });
  });

  it('refuses dates that end before they start', () => {
    expect(check({ ...base, periodEnd: '2025-12-31' })).toEqual({ period: 'The last day comes before the first: check the dates' });
    expect(check(base)).toBeNull();
  });

  it('runs a weekly challenge over the ISO weeks of its year: 53 in 2026, 52 in 2027', () => {
    // isoWeeksOfYear (WHATWG HTML week rule): 2026 runs from Monday 29 December 2025 to Sunday 3 January 2027;
    // 2027 from Monday 4 January 2027 to Sunday 2 January 2028.
    expect(newChallengeFields({ ...base, kind: 'weekly', weekYear: '2026' }, ids, '2026-01-01')).toEqual({
      name: 'A book a week, 2026',
      kind: 'weekly',
      celebratedAt: null,
      periodStart: '2025-12-29',
      periodEnd: '2027-01-03',
    });
    expect(newChallengeFields({ ...base, kind: 'weekly', weekYear: '2027' }, ids, '2026-01-01')).toEqual(
      jasmine.objectContaining({ periodStart: '2027-01-04', periodEnd: '2028-01-02' }),
    );
    expect(check({ ...base, kind: 'weekly', weekYear: '26' })).toEqual({ weekYear: jasmine.any(String) });
  });

  it('starts a weekly challenge this week unless the reader asks for the whole year', () => {
    // ISO 8601: Friday 4 December 2026 is in week 49, which opens on Monday 30 November.
    expect(newChallengeFields({ ...base, kind: 'weekly', weekFrom: 'this-week' }, ids, '2026-12-04')).toEqual(
      jasmine.objectContaining({ periodStart: '2026-11-30', periodEnd: '2027-01-03' }),
    );
    expect(newChallengeFields({ ...base, kind: 'weekly', weekFrom: 'whole-year' }, ids, '2026-12-04')).toEqual(
      jasmine.objectContaining({ periodStart: '2025-12-29' }),
    );
  });

  it('keeps only the fields a kind uses, and names an unnamed challenge', () => {
    expect(newChallengeFields({ ...base, target: 'other', otherTarget: '12' }, ids, '2026-01-01')).toEqual({
      name: '12 books in 2026',
      kind: 'count',
      celebratedAt: null,
      target: 12,
      periodStart: '2026-01-01',
      periodEnd: '2026-12-31',
    });
    expect(newChallengeFields({ ...base, kind: 'alphabet', alphabetBy: 'author-surname', name: ' Surnames ' }, ids, '2026-01-01')).toEqual({
      name: 'Surnames',
      kind: 'alphabet',
      celebratedAt: null,
      alphabetBy: 'author-surname',
      periodStart: '2026-01-01',
      periodEnd: '2026-12-31',
    });
    const prompts = newChallengeFields({ ...base, kind: 'prompts', prompts: ['A book set at sea', '  ', ' A debut '] }, () => 'p', '2026-01-01');
    expect(prompts.prompts).toEqual([
      { id: 'p', text: 'A book set at sea', bookId: null },
      { id: 'p', text: 'A debut', bookId: null },
    ]);
  });
});
