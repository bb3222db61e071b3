import type { AbstractControl, ValidationErrors } from '@angular/forms';

import type { PatchOf } from '@shared/sync/schema/collection';
import type { Reading, readings } from '@shared/sync/schema/collections';
import { optionalText } from '@shared/text/form-text';

/** The reading editor's form values. */
export interface ReadingFormValue {
  startedOn: string;
  finishedOn: string;
  rating: string;
  summary: string;
  review: string;
  takeaways: string;
  recommend: NonNullable<Reading['recommend']> | '';
  recommendTo: string;
}

export const EMPTY_READING_FORM: ReadingFormValue = {
  startedOn: '',
  finishedOn: '',
  rating: '',
  summary: '',
  review: '',
  takeaways: '',
  recommend: '',
  recommendTo: '',
};

export function toReadingForm(reading: Reading): ReadingFormValue {
  return {
    startedOn: reading.startedOn ?? '',
    finishedOn: reading.finishedOn ?? '',
    rating: reading.rating == null ? '' : String(reading.rating),
    summary: reading.summary ?? '',
    review: reading.review ?? '',
    takeaways: reading.takeaways ?? '',
    recommend: reading.recommend ?? '',
    recommendTo: reading.recommendTo ?? '',
  };
}

export function toReadingFields(value: ReadingFormValue): PatchOf<typeof readings> {
  return {
    startedOn: optionalText(value.startedOn),
    finishedOn: optionalText(value.finishedOn),
    rating: value.rating === '' ? null : Number(value.rating),
    summary: optionalText(value.summary),
    review: optionalText(value.review),
    takeaways: optionalText(value.takeaways),
    recommend: value.recommend === '' ? null : value.recommend,
    recommendTo: optionalText(value.recommendTo),
  };
}

/** Only the fields the reader changed, so other devices' edits to the same reading survive. */
export function changedReadingFields(before: ReadingFormValue, after: ReadingFormValue): PatchOf<typeof readings> {
  const old = toReadingFields(before);
  return Object.fromEntries(Object.entries(toReadingFields(after)).filter(([field, value]) => value !== old[field as keyof typeof old])) as PatchOf<typeof readings>;
}

/**
 * A reading cannot finish before it started, nor finish in the future. Dates are compared as
 * ISO 8601 calendar dates, which order as plain text.
 */
export function readingDatesValidator(today: () => string) {
  return (group: AbstractControl<ReadingFormValue>): ValidationErrors | null => {
    const { startedOn, finishedOn } = group.value;
    if (startedOn && finishedOn && finishedOn < startedOn) return { dates: 'It finished before it started: check the dates' };
    if (finishedOn && finishedOn > today()) return { dates: 'The finish date is in the future' };
    return null;
  };
}
