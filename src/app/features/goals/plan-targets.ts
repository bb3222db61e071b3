import { effect, inject, signal, type Signal } from '@angular/core';

import type { GoalUnit } from '@shared/goals/goal-unit';
import { UnsavedWork } from '../../core/pwa/unsaved-work';
import { changedTargets, targetsForm, targetTexts, type StoredTargets, type TargetsForm } from './targets-form';

/** The targets form of the year or month a page shows, and what saving it does. */
export interface PlanTargets {
  readonly form: TargetsForm;
  /** Set by a save; cleared when the form is filled again from the stored plan. */
  readonly saved: Signal<boolean>;
  /** Writes the targets the reader changed (nothing when the form is invalid); true when it saved. */
  save(): Promise<boolean>;
  /** Puts back the targets as last filled or saved. */
  cancel(): void;
}

/**
 * A plan's targets form for a page (call it in an injection context). It follows the stored
 * targets (another device's edit) unless the reader is typing, starts afresh when `key` names
 * another plan, and saves only the targets changed here, so a target set on another device in the
 * meantime is not written over.
 */
export function planTargets(options: {
  readonly max: Readonly<Record<GoalUnit, number>>;
  /** The plan shown (its stored targets), or undefined before it has any. */
  readonly plan: () => StoredTargets | undefined;
  /** Which plan is shown; null for a route that names none (nothing is saved then). */
  readonly key: () => string | number | null;
  readonly write: (targets: StoredTargets) => Promise<void>;
  /** Called each time the form is filled from the stored plan. */
  readonly refilled?: () => void;
}): PlanTargets {
  const form = targetsForm(options.max);
  const saved = signal(false);
  let original = form.getRawValue();
  inject(UnsavedWork).trackForm(form);
  let filledFor: string | number | null = null;
  effect(() => {
    const texts = targetTexts(options.plan());
    const key = options.key();
    if (form.dirty && key === filledFor) return;
    filledFor = key;
    original = texts;
    form.reset(texts);
    options.refilled?.();
    saved.set(false);
  });
  return {
    form,
    saved,
    async save() {
      form.markAllAsTouched();
      if (form.invalid || options.key() === null) return false;
      const after = form.getRawValue();
      await options.write(changedTargets(original, after));
      original = after;
      form.markAsPristine();
      saved.set(true);
      return true;
    },
    cancel() {
      form.reset(original);
    },
  };
}
