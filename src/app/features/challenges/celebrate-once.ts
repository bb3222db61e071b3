import { effect, inject, signal, type Signal } from '@angular/core';

import type { Challenge } from '@shared/sync/schema/collections';

import { JournalStore } from '../../core/data/journal-store';
import { CLOCK } from '../../core/time/clock';

/**
 * Finished challenges not yet celebrated are celebrated on this page, once: their `celebratedAt`
 * is written at once (and syncs, so other devices do not celebrate again), while the banner
 * stays for this visit until closed. Call in an injection context.
 *
 * @param finished the challenges on the page, each with whether it is finished now.
 * @returns the ids to show a celebration for, and a way to close one.
 */
export function celebrateOnce(finished: Signal<readonly { readonly challenge: Challenge; readonly finished: boolean }[]>): {
  readonly showing: Signal<ReadonlySet<string>>;
  readonly close: (id: string) => void;
} {
  const store = inject(JournalStore);
  const clock = inject(CLOCK);
  const showing = signal<ReadonlySet<string>>(new Set());
  const written = new Set<string>();
  effect(() => {
    for (const { challenge, finished: done } of finished()) {
      if (!done || challenge.celebratedAt || written.has(challenge.id)) continue;
      written.add(challenge.id);
      showing.update((ids) => new Set([...ids, challenge.id]));
      void store.write('challenges', challenge.id, { celebratedAt: new Date(clock.now()).toISOString() });
    }
  });
  return {
    showing: showing.asReadonly(),
    close: (id) => showing.update((ids) => new Set([...ids].filter((shown) => shown !== id))),
  };
}
