/** What 300 $a (extent) tells about a book's length. */
export interface Extent {
  readonly pages: number | null;
  readonly minutes: number | null;
}

/** A pagination statement: sequences of roman, arabic or [bracketed] numbers before "pages". */
const PAGINATION =
  /(?<![A-Za-z])((?:(?:ca\.|approximately)\s*)?(?:\[?\d+\]?|[ivxlcdm]+)(?:\s*,\s*(?:\[?\d+\]?|[ivxlcdm]+))*)\s*(?:unnumbered\s+)?(?:pages?\b|p\.|p\b|leaves\b|leaf\b)/i;
const HOURS = /(\d+(?:\.\d+)?)\s*(?:hr|hrs|hours?|h)\b/i;
const MINUTES = /(\d+)\s*(?:min|mins|minutes?)\b/i;

/**
 * Reads a page count or a playing time from a 300 $a extent (MARC 21 Bibliographic, "300 –
 * Physical Description"; how to read pagination is AACR2 2.5B / RDA 3.4.5). The page count is
 * the last numbered page of the main sequence: "xii, 345 pages" → 345 (the roman preliminaries
 * are not counted); a bracketed count is used only when nothing is numbered ("[32] pages").
 * A playing time is the total in minutes: "1 audio disc (9 hr., 15 min.)" → 555.
 *
 * @example
 * parseExtent('xii, 345 pages ;')               // { pages: 345, minutes: null }
 * parseExtent('1 audio disc (9 hr., 15 min.)')  // { pages: null, minutes: 555 }
 */
export function parseExtent(extent: string): Extent {
  return { pages: pagesOf(extent), minutes: minutesOf(extent) };
}

function pagesOf(extent: string): number | null {
  const statement = PAGINATION.exec(extent)?.[1];
  if (!statement) return null;
  const numbered = [...statement.matchAll(/(?<!\[)\b(\d+)\b(?!\])/g)].map((m) => Number(m[1]));
  const bracketed = [...statement.matchAll(/\[(\d+)\]/g)].map((m) => Number(m[1]));
  const pages = numbered.length > 0 ? Math.max(...numbered) : bracketed.length > 0 ? bracketed.reduce((a, b) => a + b, 0) : null;
  return pages && pages > 0 ? pages : null;
}

function minutesOf(extent: string): number | null {
  const hours = HOURS.exec(extent);
  const minutes = MINUTES.exec(extent);
  if (!hours && !minutes) return null;
  const total = Math.round(Number(hours?.[1] ?? 0) * 60) + Number(minutes?.[1] ?? 0);
  return total > 0 ? total : null;
}

/**
 * A playing time from 306 $a, "hhmmss" (MARC 21 Bibliographic, "306 – Playing Time"):
 * "091500" → 555 minutes, seconds rounded.
 */
export function playingTimeMinutes(value: string): number | null {
  const match = /^(\d{2})(\d{2})(\d{2})$/.exec(value.trim());
  if (!match) return null;
  const minutes = Number(match[1]) * 60 + Number(match[2]) + Math.round(Number(match[3]) / 60);
  return minutes > 0 ? minutes : null;
}
