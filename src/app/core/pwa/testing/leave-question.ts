import { TestBed } from '@angular/core/testing';

import { patiently } from '../../testing/patience';

/** The open "Leave without saving?" dialog, if any. */
export const leaveQuestion = (): Element | null => document.querySelector('ll-leave-dialog');

/** One of its two buttons. */
export const leaveAnswer = (text: 'Leave' | 'Keep editing'): HTMLButtonElement =>
  [...document.querySelectorAll<HTMLButtonElement>('ll-leave-dialog button')].find((button) => button.textContent?.trim() === text)!;

/**
 * Waits until `check` passes, running change detection in between. Not `whenStable`: a navigation
 * waiting on the question is a pending task, so the app never settles while it asks.
 */
export async function untilTicked(check: () => boolean, what: string): Promise<void> {
  await patiently(what, check, () => TestBed.tick());
}
