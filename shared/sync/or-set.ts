import { parseHlc } from './hlc';

/**
 * The merge state of one set-valued field (tags, label ids): an observed-remove set (Shapiro,
 * Preguiça, Baquero, Zawirski 2011, "A comprehensive study of Convergent and Commutative
 * Replicated Data Types", §3.3.5 OR-Set), with each device's adds of an element folded into one
 * clock.
 *
 * Per element and per device (the node id at the end of a clock): `a` is the greatest clock at
 * which that device added the element, `r` the greatest of that device's add clocks a remove
 * has seen. The element is in the set when some device's `a` is greater than its `r`: an add no
 * remove has seen. A device's adds of one element are ordered by its own clock, so a remove that
 * saw its latest add saw them all — the folding loses nothing.
 *
 * Joining two states takes the greatest clock per element, device and side: commutative,
 * associative and idempotent, so devices and the server converge whatever the order, and a
 * change on the wire is just a small state (a delta) joined in like any other.
 */
export type OrSetState = Readonly<Record<string, OrSetEntry>>;
export interface OrSetEntry {
  readonly a: Readonly<Record<string, string>>;
  readonly r: Readonly<Record<string, string>>;
}

const maxClock = (x: string | undefined, y: string | undefined) => (x === undefined ? y : y === undefined || x >= y ? x : y);

/** Sets an own property even for keys such as `__proto__` (a tag may be any text). */
function setOwn<T>(target: Record<string, T>, key: string, value: T): void {
  Object.defineProperty(target, key, { value, enumerable: true, writable: true, configurable: true });
}
const own = <T>(record: Readonly<Record<string, T>>, key: string): T | undefined => (Object.hasOwn(record, key) ? record[key] : undefined);

function joinClocks(x: Readonly<Record<string, string>> = {}, y: Readonly<Record<string, string>> = {}): Record<string, string> {
  const out: Record<string, string> = { ...x };
  for (const [node, clock] of Object.entries(y)) setOwn(out, node, maxClock(own(out, node), clock)!);
  return out;
}

/** The least upper bound of two states (either may be missing). */
export function joinOrSet(x: OrSetState | null | undefined, y: OrSetState | null | undefined): OrSetState {
  if (!x) return y ?? {};
  if (!y) return x;
  const out: Record<string, OrSetEntry> = { ...x };
  for (const [element, entry] of Object.entries(y)) {
    const mine = own(out, element);
    setOwn(out, element, mine ? { a: joinClocks(mine.a, entry.a), r: joinClocks(mine.r, entry.r) } : { a: { ...entry.a }, r: { ...entry.r } });
  }
  return out;
}

/** The earliest add clock of an element that no remove has seen, or `null` when it is not in the set. */
function firstLiveAdd(entry: OrSetEntry): string | null {
  let first: string | null = null;
  for (const [node, clock] of Object.entries(entry.a)) {
    const removed = own(entry.r, node);
    if ((removed === undefined || clock > removed) && (first === null || clock < first)) first = clock;
  }
  return first;
}

/**
 * The elements in the set, in the order they were first added (then by text), so every device
 * and the server list them alike. The server's SQL (`lamplight_orset_elements`) orders the same way.
 */
export function orSetElements(state: OrSetState | null | undefined): string[] {
  if (!state) return [];
  const live: [string, string][] = [];
  for (const [element, entry] of Object.entries(state)) {
    const first = firstLiveAdd(entry);
    if (first !== null) live.push([first, element]);
  }
  return live.sort(([c1, e1], [c2, e2]) => compareBytes(c1, c2) || compareBytes(e1, e2)).map(([, element]) => element);
}

/**
 * The delta that turns `state` into exactly `next`: adds (at `hlc`) what is missing and removes
 * what `next` left out — only the adds this state has seen. A device's local edit and an older
 * app's whole-list push ("set to exactly this", read against the server's state) both go
 * through here.
 */
export function orSetDelta(state: OrSetState | null | undefined, next: readonly string[], hlc: string, options: { onlySeenBefore?: boolean } = {}): OrSetState {
  const node = parseHlc(hlc)?.node;
  if (!node) throw new RangeError(`Not a clock: ${hlc}`);
  const current = new Set(orSetElements(state));
  const wanted = new Set(next);
  const delta: Record<string, OrSetEntry> = {};
  for (const element of wanted) if (!current.has(element)) setOwn(delta, element, { a: { [node]: hlc }, r: {} });
  for (const element of current) {
    if (wanted.has(element)) continue;
    // An older app's list was written at `hlc`: it cannot have seen adds made after it.
    const seen = Object.entries(own(state!, element)!.a).filter(([, clock]) => !options.onlySeenBefore || clock < hlc);
    if (seen.length > 0) setOwn(delta, element, { a: {}, r: Object.fromEntries(seen) });
  }
  return delta;
}

/** A plain list written at one clock, as a state: how lists kept before sets merged per element are read. */
export const orSetFromList = (list: readonly string[], hlc: string): OrSetState => orSetDelta(null, list, hlc);

/** Whether a state has nothing in it (a delta that changes nothing). */
export const isEmptyOrSet = (state: OrSetState): boolean => Object.keys(state).length === 0;

/** Every clock a state mentions, greatest first: the field's clock is the greatest of them. */
export function greatestClock(state: OrSetState): string | null {
  let greatest: string | null = null;
  for (const entry of Object.values(state)) {
    for (const clock of [...Object.values(entry.a), ...Object.values(entry.r)]) greatest = maxClock(greatest ?? undefined, clock)!;
  }
  return greatest;
}

/** Every clock a state names, in no particular order. */
export const orSetClocks = (state: OrSetState): string[] => Object.values(state).flatMap(({ a, r }) => [...Object.values(a), ...Object.values(r)]);

/**
 * Code-point order, which is the byte order of the UTF-8 forms: how PostgreSQL's COLLATE "C"
 * compares (JavaScript's `<` compares UTF-16 units, which differs above U+FFFF).
 */
export function compareBytes(x: string, y: string): number {
  if (x === y) return 0;
  const a = [...x];
  const b = [...y];
  const length = Math.min(a.length, b.length);
  for (let i = 0; i < length; i++) {
    const diff = a[i]!.codePointAt(0)! - b[i]!.codePointAt(0)!;
    if (diff !== 0) return diff;
  }
  return a.length - b.length;
}

/**
 * The same state with its clocks renamed (a re-stamp after `clock_ahead`): a set change carries
 * its clock inside its adds and removes too, so those must move with the change's own clock.
 */
export function renameOrSetClocks(state: OrSetState, rename: (hlc: string) => string): OrSetState {
  const side = (clocks: Readonly<Record<string, string>>) => Object.fromEntries(Object.entries(clocks).map(([node, hlc]) => [node, rename(hlc)]));
  return Object.fromEntries(Object.entries(state).map(([element, { a, r }]) => [element, { a: side(a), r: side(r) }]));
}
