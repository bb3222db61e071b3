import { deterministicId } from '../sync/deterministic-id';
import type { Label } from '../sync/schema/collections';

/**
 * The labels every reader starts with, of our own design. Their ids are name-based, so a reader
 * who renames or recolours one writes to the same row on every device.
 */
/** A label with everything it needs to be drawn. */
export type CompleteLabel = Required<Pick<Label, 'id' | 'name' | 'colour' | 'icon'>>;

/** 'five-stars' keeps its key (and so its id) from before it was renamed "A keeper": a rename is a field write. */
const starters: readonly (Omit<CompleteLabel, 'id'> & { key: string })[] = [
  { key: 'five-stars', name: 'A keeper', colour: 'amber', icon: 'star' },
  { key: 're-read', name: 'Re-read', colour: 'teal', icon: 'repeat' },
  { key: 'buddy-read', name: 'Buddy read', colour: 'sky', icon: 'group' },
  { key: 'comfort-read', name: 'Comfort read', colour: 'rose', icon: 'local_cafe' },
  { key: 'page-turner', name: 'Page-turner', colour: 'plum', icon: 'bolt' },
  { key: 'slow-and-lovely', name: 'Slow and lovely', colour: 'sage', icon: 'spa' },
];

export const STARTER_LABELS: readonly CompleteLabel[] = starters.map(({ key, ...label }) => ({
  id: deterministicId('starter-label', key),
  ...label,
}));

/**
 * The reader's labels: the starter set (as the reader may have changed it) plus their own, in
 * a stable order — starters first, then the reader's by name. Deleted ones are left out.
 *
 * @example
 * mergeLabels([]) // the starter set
 */
export function mergeLabels(stored: readonly Label[]): CompleteLabel[] {
  const byId = new Map(stored.map((label) => [label.id, label]));
  const starters = STARTER_LABELS.map((starter) => ({ ...starter, ...definedFields(byId.get(starter.id)) })).filter((label) => !byId.get(label.id)?.deleted);
  const starterIds = new Set(STARTER_LABELS.map((label) => label.id));
  const own = stored
    .filter((label) => !starterIds.has(label.id) && !label.deleted && label.name && label.colour && label.icon)
    .map((label) => ({ id: label.id, name: label.name!, colour: label.colour!, icon: label.icon! }))
    .sort((a, b) => a.name.localeCompare(b.name));
  return [...starters, ...own];
}

function definedFields(label: Label | undefined): Partial<Pick<Label, 'name' | 'colour' | 'icon'>> {
  if (!label) return {};
  return Object.fromEntries(Object.entries({ name: label.name, colour: label.colour, icon: label.icon }).filter(([, v]) => v != null));
}
