import { ChangeDetectionStrategy, Component } from '@angular/core';

import type { JournalDb } from '../data/journal-db';
import type { JournalStore } from '../data/journal-store';
import { CLOCK, fixedClock } from '../time/clock';
import { TIME_ZONE } from '../time/time-zone';
import { BROWSER_LOCALE } from '../settings/reader-settings';
import { openTestJournal } from './test-journal';

/** Noon on 1 July 2026 in Los Angeles (PDT, UTC−7): the "now" of goal specs unless they say otherwise. */
export const JULY_FIRST_NOON_LA = '2026-07-01T19:00:00.000Z';

/** Where specs' navigations land. */
@Component({ selector: 'll-spec-landing', template: '', changeDetection: ChangeDetectionStrategy.OnPush })
class SpecLanding {}

/**
 * A signed-in reader with a fresh real IndexedDB journal, a fixed time zone and clock, and a
 * router. Call in `beforeEach`; `tearDown` in `afterEach`.
 */
export async function setUpGoalSpec(
  options: { timeZone?: string; now?: string } = {},
): Promise<{ store: JournalStore; db: () => JournalDb; tearDown: () => Promise<void> }> {
  const journal = openTestJournal(
    [
      { provide: TIME_ZONE, useValue: options.timeZone ?? 'America/Los_Angeles' },
      // Dates in one fixed locale, whatever the test browser's language.
      { provide: BROWSER_LOCALE, useValue: 'en-GB' },
      { provide: CLOCK, useValue: fixedClock(new Date(options.now ?? JULY_FIRST_NOON_LA).getTime()) },
    ],
    [{ path: '**', component: SpecLanding }],
  );
  await journal.db.open(); // before any spec ends, so teardown never closes it mid-open
  return { store: journal.store, db: () => journal.db, tearDown: () => journal.close() };
}

/** Waits, a few milliseconds at a time, until `check` passes (live queries answer asynchronously). */
export { waitFor as until } from './test-journal';

/** The text of an element as words: its text pieces joined by spaces, icon names left out. */
export function textOf(element: Element | null | undefined): string {
  if (!element) return '';
  const pieces: string[] = [];
  const walker = document.createTreeWalker(element, NodeFilter.SHOW_TEXT);
  for (let node = walker.nextNode(); node; node = walker.nextNode()) {
    if (!node.parentElement?.closest('mat-icon')) pieces.push(node.textContent ?? '');
  }
  return pieces.join(' ').replace(/\s+/g, ' ').trim();
}

/** The field whose label reads `label`, as a reader finds it; null while there is none. */
export function fieldIfShown<T extends HTMLElement = HTMLInputElement>(root: HTMLElement, label: string): T | null {
  const found = Array.from(root.querySelectorAll('label')).find((element) => textOf(element).replace(/\s*\*$/, '') === label);
  const control = found?.htmlFor ? document.getElementById(found.htmlFor) : found?.querySelector('input, select, textarea');
  return control as T | null;
}

/** The field whose label reads `label`, as a reader finds it. */
export function field<T extends HTMLElement = HTMLInputElement>(root: HTMLElement, label: string): T {
  const control = fieldIfShown<T>(root, label);
  if (!control) throw new Error(`no field labelled ${label}`);
  return control;
}

/** Sets a text field's value as typing would, and tells Angular. */
export function type(input: HTMLInputElement | HTMLTextAreaElement, value: string): void {
  input.value = value;
  input.dispatchEvent(new Event('input'));
}

/** Picks an option of a native select, and tells Angular. */
export function choose(select: HTMLSelectElement, value: string): void {
  select.value = value;
  select.dispatchEvent(new Event('change'));
}
