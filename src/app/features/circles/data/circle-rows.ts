import type { CirclePulledRow } from '@shared/circles/circle-wire';
import { mergeField } from '@shared/sync/merge';

/** A circle row on this device: its fields, each field's clock under `_hlc`, and its author. */
export interface LocalCircleRow {
  readonly id: string;
  readonly _hlc: Readonly<Record<string, string>>;
  readonly _author?: string;
  readonly [field: string]: unknown;
}

/**
 * Merges a pulled row into the local one with the shared per-field rule (shared/sync/merge.ts):
 * a field the device wrote later than the pulled value keeps the device's value, so posts written
 * offline survive a pull that arrives before their push.
 */
export function mergePulledRow(local: LocalCircleRow | undefined, pulled: CirclePulledRow): LocalCircleRow {
  const next: Record<string, unknown> = { ...(local ?? { id: pulled.id }), _hlc: { ...local?._hlc }, _author: pulled.authorId };
  const clocks = next['_hlc'] as Record<string, string>;
  for (const [field, incoming] of Object.entries(pulled.fields)) {
    const current = clocks[field] === undefined ? undefined : { value: local?.[field], hlc: clocks[field] };
    const winner = mergeField(current, incoming);
    next[field] = winner.value;
    clocks[field] = winner.hlc;
  }
  return next as LocalCircleRow;
}
