import { parseHlc } from './hlc';
import { isEmptyOrSet, joinOrSet, orSetDelta, orSetElements, orSetFromList, type OrSetState } from './or-set';

/** A set field's value with its clock (the greatest seen) and its per-element state. */
export interface StampedSet {
  readonly value: string[];
  readonly hlc: string;
  readonly state: OrSetState;
}

/** What a change to a set field may carry: a pulled state, this app's delta, or an older app's whole list. */
export interface SetChange {
  readonly value: unknown;
  readonly hlc: string;
  /** A pulled change's `state`; a string is a mergeable text's Yjs state and never a set field's. */
  readonly state?: OrSetState | string;
}

/** A set field's state as kept, reading a plain list stored before sets merged per element. */
export function currentSetState(current: { value?: unknown; hlc?: string; state?: OrSetState | null } | undefined): OrSetState | undefined {
  if (!current) return undefined;
  if (current.state) return current.state;
  return Array.isArray(current.value) && current.hlc ? orSetFromList(current.value as string[], current.hlc) : undefined;
}

/**
 * The state a change adds. A list means "set to exactly this" as of its clock: it adds what is
 * missing and removes only adds older than itself (an older app could not have seen newer ones).
 */
export function setDeltaOf(current: OrSetState | undefined, change: SetChange): OrSetState {
  if (change.state && typeof change.state === 'object') return change.state;
  if (Array.isArray(change.value)) return orSetDelta(current, change.value as string[], change.hlc, { onlySeenBefore: true });
  return typeof change.value === 'object' && change.value !== null ? (change.value as OrSetState) : {};
}

/** Merges one change into a set field: states join; the field's clock is the greatest seen. */
export function mergeSetField(current: { value?: unknown; hlc?: string; state?: OrSetState | null } | undefined, change: SetChange): StampedSet {
  const before = currentSetState(current);
  const state = joinOrSet(before, setDeltaOf(before, change));
  const hlc = current?.hlc && current.hlc > change.hlc ? current.hlc : change.hlc;
  return { value: orSetElements(state), hlc, state };
}

const NODE = /^[A-Za-z0-9-]{1,64}$/;

/**
 * What is wrong with a pushed set delta, or `null`: elements within the field's limits, and each
 * clock a well-formed clock of the device it is filed under, no later than the change's own.
 */
export function setDeltaProblem(value: unknown, limits: { maxItems: number; maxLength: number }, changeHlc: string): string | null {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) return 'must be a list or a set change';
  const entries = Object.entries(value as Record<string, unknown>);
  // Removes may name more than the field holds after concurrent adds; still bounded.
  if (entries.length > limits.maxItems * 4) return `may change at most ${limits.maxItems * 4} entries at once`;
  if (isEmptyOrSet(value as OrSetState)) return null;
  for (const [element, entry] of entries) {
    if (element.length > limits.maxLength) return `each entry must be at most ${limits.maxLength} characters`;
    if (typeof entry !== 'object' || entry === null) return 'each set entry must be { a, r }';
    const { a, r, ...rest } = entry as Record<string, unknown>;
    if (Object.keys(rest).length > 0) return 'each set entry must be { a, r }';
    for (const side of [a, r]) {
      if (typeof side !== 'object' || side === null || Array.isArray(side)) return 'each set entry must be { a, r }';
      const clocks = Object.entries(side as Record<string, unknown>);
      if (clocks.length > 64) return 'a set entry may name at most 64 devices';
      for (const [node, clock] of clocks) {
        const parsed = typeof clock === 'string' ? parseHlc(clock) : null;
        if (!NODE.test(node) || !parsed || parsed.node !== node) return 'set entries must map device ids to their clocks';
        if ((clock as string) > changeHlc) return 'a set entry may not carry a clock later than its change';
      }
    }
  }
  return null;
}
