import { computed, Injectable } from '@angular/core';

import { mergeLabels } from '@shared/journal/starter-labels';
import type { Label } from '@shared/sync/schema/collections';

import { liveQuerySignal } from '../data/live-query';

/** One label as the UI shows it. */
export type LabelView = ReturnType<typeof mergeLabels>[number];

/** The reader's labels (starter set plus their own), live from this device. */
@Injectable({ providedIn: 'root' })
export class LabelDirectory {
  private readonly stored = liveQuerySignal((db) => db.rows('labels').toArray(), [] as Label[]);
  /** Every label, starters first. */
  readonly all = computed(() => mergeLabels(this.stored()));
  readonly byId = computed(() => new Map(this.all().map((label) => [label.id, label])));
}
