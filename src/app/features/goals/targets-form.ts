import { FormControl, FormGroup, Validators } from '@angular/forms';

import type { GoalUnit } from '@shared/goals/goal-unit';

/** The target fields of a year or month plan, by unit. */
export const TARGET_FIELDS = { books: 'booksTarget', pages: 'pagesTarget', minutes: 'minutesTarget' } as const satisfies Record<GoalUnit, string>;

/** Targets as stored: a whole number, or null for none. */
export type StoredTargets = Partial<Record<(typeof TARGET_FIELDS)[GoalUnit], number | null>>;

/** A control for one target: blank for none, else a whole number from 1 to `max`. */
export function targetControl(max: number): FormControl<string> {
  return new FormControl('', { nonNullable: true, validators: [Validators.pattern(/^\s*\d*\s*$/), Validators.min(1), Validators.max(max)] });
}

/** A year's or month's targets form: one control a unit, each up to its `max`. */
export type TargetsForm = FormGroup<Record<GoalUnit, FormControl<string>>>;

export function targetsForm(max: Readonly<Record<GoalUnit, number>>): TargetsForm {
  return new FormGroup({ books: targetControl(max.books), pages: targetControl(max.pages), minutes: targetControl(max.minutes) });
}

/** The form's text as a stored target. */
export function toTarget(text: string): number | null {
  return text.trim() === '' ? null : Number(text);
}

/** A stored target as the form's text. */
export function targetText(value: number | null | undefined): string {
  return value == null ? '' : String(value);
}

/** The texts of a targets form, by unit. */
export type TargetTexts = Readonly<Record<GoalUnit, string>>;

/** A plan's targets as the form's texts. */
export function targetTexts(plan: StoredTargets | undefined): TargetTexts {
  return { books: targetText(plan?.booksTarget), pages: targetText(plan?.pagesTarget), minutes: targetText(plan?.minutesTarget) };
}

/**
 * Only the targets the reader changed since the form was filled (`before`), so a target set on
 * another device in the meantime is not written over with what this page showed.
 *
 * @example
 * changedTargets({ books: '12', pages: '', minutes: '' }, { books: '12', pages: '4000', minutes: '' })
 * // { pagesTarget: 4000 }
 */
export function changedTargets(before: TargetTexts, after: TargetTexts): StoredTargets {
  const patch: StoredTargets = {};
  for (const unit of ['books', 'pages', 'minutes'] as const) {
    const value = toTarget(after[unit]);
    if (value !== toTarget(before[unit])) patch[TARGET_FIELDS[unit]] = value;
  }
  return patch;
}

/** Stored targets as the amounts `goalPacing` and `monthProgress` take; a unit without one is left out. */
export function targetsByUnit(plan: StoredTargets | undefined): Partial<Record<GoalUnit, number>> {
  const targets: Partial<Record<GoalUnit, number>> = {};
  for (const unit of ['books', 'pages', 'minutes'] as const) {
    const value = plan?.[TARGET_FIELDS[unit]];
    if (value != null) targets[unit] = value;
  }
  return targets;
}
