import type { AbstractControl, ValidationErrors } from '@angular/forms';

import { isoWeeksOfYear } from '@shared/calendar/iso-weeks-of-year';
import { weeklyChallengeStart, type WeeklyChallengeFrom } from '@shared/challenges/weekly-challenge-start';
import type { PatchOf } from '@shared/sync/schema/collection';
import type { Challenge, challenges } from '@shared/sync/schema/collections';

import { defaultChallengeName } from '../../../ui/challenge-labels';

/** The new-challenge form's values. */
export interface ChallengeFormValue {
  kind: NonNullable<Challenge['kind']>;
  name: string;
  /** A ready-made target ('25', '50', '100') or 'other' for `otherTarget`. */
  target: string;
  otherTarget: string;
  alphabetBy: NonNullable<Challenge['alphabetBy']>;
  periodStart: string;
  periodEnd: string;
  /** Weekly: the ISO week-numbering year. */
  weekYear: string;
  /** Weekly: count from this week (the default), or every week of the year. */
  weekFrom: WeeklyChallengeFrom;
  prompts: string[];
}

/** The books a count challenge asks for: the ready-made one, or the reader's own number. */
export function countTarget(value: Pick<ChallengeFormValue, 'target' | 'otherTarget'>): number | null {
  const text = value.target === 'other' ? value.otherTarget.trim() : value.target;
  return /^\d+$/.test(text) && Number(text) >= 1 && Number(text) <= 10_000 ? Number(text) : null;
}

/** The weekly challenge's year, when it is one we can lay out (1900–3000, as year plans). */
export function weekYear(text: string): number | null {
  return /^\d{4}$/.test(text.trim()) && Number(text) >= 1900 && Number(text) <= 3000 ? Number(text) : null;
}

/** Checks what each kind needs: a target, a year, or dates that end on or after they start. */
export function challengeFormValidator(group: AbstractControl<ChallengeFormValue>): ValidationErrors | null {
  const value = group.getRawValue() as ChallengeFormValue;
  if (value.kind === 'count' && countTarget(value) === null) return { target: 'Choose how many books: a whole number from 1 to 10,000' };
  if (value.kind === 'weekly') return weekYear(value.weekYear) === null ? { weekYear: 'Give a year from 1900 to 3000' } : null;
  if (!value.periodStart || !value.periodEnd) return { period: 'Give the first and last day' };
  // ISO 8601 dates order as text.
  if (value.periodEnd < value.periodStart) return { period: 'The last day comes before the first: check the dates' };
  return null;
}

/**
 * The row for a new challenge: only the fields its kind uses. A weekly challenge runs to the
 * Sunday of the last ISO week of its year, from the Monday of this week or of week 1.
 *
 * @param today the reader's local date, 'YYYY-MM-DD'.
 */
export function newChallengeFields(value: ChallengeFormValue, newId: () => string, today: string): PatchOf<typeof challenges> {
  const year = value.kind === 'weekly' ? weekYear(value.weekYear)! : Number(value.periodStart.slice(0, 4));
  const target = value.kind === 'count' ? countTarget(value)! : undefined;
  const name = value.name.trim() || defaultChallengeName(value.kind, { target, year });
  const base = { name, kind: value.kind, celebratedAt: null };
  switch (value.kind) {
    case 'count':
      return { ...base, target, periodStart: value.periodStart, periodEnd: value.periodEnd };
    case 'alphabet':
      return { ...base, alphabetBy: value.alphabetBy, periodStart: value.periodStart, periodEnd: value.periodEnd };
    case 'weekly': {
      const weeks = isoWeeksOfYear(year);
      return { ...base, periodStart: weeklyChallengeStart({ year, today, from: value.weekFrom }), periodEnd: weeks[weeks.length - 1].sunday };
    }
    case 'prompts': {
      const prompts = value.prompts.map((text) => text.trim()).filter((text) => text !== '');
      return { ...base, periodStart: value.periodStart, periodEnd: value.periodEnd, prompts: prompts.map((text) => ({ id: newId(), text, bookId: null })) };
    }
  }
}
