import { FormControl, FormGroup } from '@angular/forms';

import { changedReadingFields, EMPTY_READING_FORM, readingDatesValidator, toReadingFields } from './reading-form-model';

describe('reading form model', () => {
  const check = (startedOn: string, finishedOn: string) =>
    readingDatesValidator(() => '2026-12-01')(new FormGroup({ startedOn: new FormControl(startedOn), finishedOn: new FormControl(finishedOn) }) as never);

  it('refuses a finish before the start and a finish in the future; ISO 8601 dates order as text', () => {
    expect(check('2026-03-10', '2026-03-09')).toEqual({ dates: 'It finished before it started: check the dates' });
    expect(check('2026-11-30', '2026-12-02')).toEqual({ dates: 'The finish date is in the future' });
    expect(check('2026-11-30', '2026-12-01')).toBeNull();
    expect(check('2026-11-30', '')).toBeNull(); // still reading
  });

  it('turns blanks into nulls and a rating into a number', () => {
    expect(toReadingFields({ ...EMPTY_READING_FORM, rating: '3.5', summary: '  Brisk and kind. ' })).toEqual({
      startedOn: null,
      finishedOn: null,
      rating: 3.5,
      summary: 'Brisk and kind.',
      review: null,
      takeaways: null,
      recommend: null,
      recommendTo: null,
    });
  });

  it('sends only what changed', () => {
    expect(changedReadingFields(EMPTY_READING_FORM, { ...EMPTY_READING_FORM, recommend: 'maybe' })).toEqual({ recommend: 'maybe' });
  });
});
