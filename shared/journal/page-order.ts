/**
 * The order of pages in a notebook, kept as a number per page (`notebookPages.position`) so a
 * page can be added or moved by writing one field of one row, without renumbering the others —
 * which would make two devices reordering offline overwrite each other's whole order.
 *
 * Precision limit: positions are doubles within ±{@link MAX_POSITION}. Halving a gap again and
 * again eventually leaves no double between two neighbours; we stop well before that, at a gap
 * of {@link MIN_POSITION_GAP}, which is more than 8 times the spacing of doubles near 1e9
 * (2^-23 ≈ 1.2e-7), so a midpoint of a gap at least that wide is always strictly inside it.
 * Starting from whole numbers that allows about 20 inserts at one spot; after that the plans
 * below {@link renumber} the notebook (0, 1, 2, …), writing only the pages whose number changes.
 */

/** The schema's bounds for `notebookPages.position`. */
export const MAX_POSITION = 1e9;
/** The smallest gap {@link positionBetween} will split. */
export const MIN_POSITION_GAP = 1e-6;
/** The distance between neighbours at the ends and after a renumber. */
export const POSITION_STEP = 1;

/** A page as far as ordering goes. */
export interface Positioned {
  readonly id: string;
  readonly position?: number | null;
}

/** One page's new position. */
export interface PositionWrite {
  readonly id: string;
  readonly position: number;
}

/**
 * A position strictly between `before` and `after` (either may be absent, for the ends): the
 * midpoint, or one step past the only neighbour, or 0 for the first page of all.
 *
 * @throws RangeError when there is no room: `before >= after`, the gap is under
 *   {@link MIN_POSITION_GAP}, or a step would leave ±{@link MAX_POSITION}. Renumber then.
 * @example
 * positionBetween(1, 2) // 1.5
 * positionBetween(3)    // 4
 * positionBetween(undefined, 0) // -1
 */
export function positionBetween(before?: number | null, after?: number | null): number {
  const b = before ?? null;
  const a = after ?? null;
  if (b === null && a === null) return 0;
  if (a === null) return fits(b! + POSITION_STEP);
  if (b === null) return fits(a - POSITION_STEP);
  if (!(a - b >= MIN_POSITION_GAP)) throw new RangeError(`No room between ${b} and ${a}; renumber the pages`);
  return b + (a - b) / 2;
}

/** Whether {@link positionBetween} has room for these neighbours. */
export function hasRoomBetween(before?: number | null, after?: number | null): boolean {
  try {
    positionBetween(before, after);
    return true;
  } catch {
    return false;
  }
}

function fits(position: number): number {
  if (!Number.isFinite(position) || Math.abs(position) > MAX_POSITION) throw new RangeError(`${position} is past ±${MAX_POSITION}; renumber the pages`);
  return position;
}

/**
 * Pages in reading order: by position, pages without one (still arriving from another device)
 * last, and equal positions (two devices that inserted at one spot offline) by id, so every
 * device shows the same order.
 */
export function byPosition<T extends Positioned>(pages: readonly T[]): T[] {
  const key = (page: Positioned) => page.position ?? Infinity;
  return [...pages].sort((x, y) => key(x) - key(y) || (x.id < y.id ? -1 : x.id > y.id ? 1 : 0));
}

/** Evenly spaced positions (0, 1, 2, …) for pages in this order; only the ones that change. */
export function renumber(ordered: readonly Positioned[]): PositionWrite[] {
  return ordered.flatMap((page, index) => (page.position === index * POSITION_STEP ? [] : [{ id: page.id, position: index * POSITION_STEP }]));
}

/**
 * The writes that put page `id` at `index` of `ordered` (0 = first; the array is the current
 * reading order, with or without that page): usually its new position alone, or a renumber
 * of the whole notebook when there is no room left at that spot.
 */
export function placeAt(ordered: readonly Positioned[], id: string, index: number): PositionWrite[] {
  const others = ordered.filter((page) => page.id !== id);
  const at = Math.max(0, Math.min(index, others.length));
  const before = others[at - 1]?.position;
  const after = others[at]?.position;
  // Pages with no position yet sit at the end; they cannot anchor a place.
  const anchored = (at === 0 || before != null) && (at === others.length || after != null);
  if (anchored && hasRoomBetween(before, after)) return [{ id, position: positionBetween(before, after) }];
  return renumber([...others.slice(0, at), { id, position: null }, ...others.slice(at)]);
}

/** The writes that add a new page `id` at the end of a notebook. */
export function appendPage(ordered: readonly Positioned[], id: string): PositionWrite[] {
  return placeAt(ordered, id, ordered.length);
}

/** The writes that move page `id` one place earlier (`-1`) or later (`+1`); none at an end. */
export function movePage(ordered: readonly Positioned[], id: string, by: -1 | 1): PositionWrite[] {
  const from = ordered.findIndex((page) => page.id === id);
  const to = from + by;
  if (from === -1 || to < 0 || to >= ordered.length) return [];
  return placeAt(ordered, id, to);
}
