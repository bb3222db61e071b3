/** Where a part of a pick ends: a page, a percent of the book, or a chapter's label. */
export type PartEnd =
  { readonly kind: 'page'; readonly page: number } | { readonly kind: 'percent'; readonly percent: number } | { readonly kind: 'chapter'; readonly label: string };

export const PART_END_KINDS = ['page', 'percent', 'chapter'] as const;

/** A part of a pick's schedule as stored (see circle-collections.ts). */
export interface SchedulePart {
  readonly id: string;
  readonly position: number;
  readonly endKind: (typeof PART_END_KINDS)[number];
  /** The page or percent as a number, or the chapter's label. */
  readonly endValue: string;
}

/** The book the schedule is for: its length in pages and (for audio) minutes. */
export interface PickLength {
  readonly pageCount?: number | null;
  readonly audioMinutes?: number | null;
}

/**
 * Reads what a host typed as a part's end: `p. 120`, `page 120` or `120` (a page), `45%` or
 * `45 percent` (a percent, up to 100), anything else (`Chapter 7`, `Part Two`) a chapter label.
 * `null` for empty text, page 0 or a percent outside 0–100.
 */
export function parsePartEnd(typed: string): PartEnd | null {
  const text = typed.trim().replace(/\s+/g, ' ');
  if (!text) return null;
  const percent = /^(\d{1,3}(?:[.,]\d+)?)\s*(?:%|percent|per cent)$/i.exec(text);
  if (percent) {
    const value = Number(percent[1]!.replace(',', '.'));
    return value > 0 && value <= 100 ? { kind: 'percent', percent: value } : null;
  }
  const page = /^(?:p\.?|pp\.?|page|pg\.?)?\s*(\d{1,6})$/i.exec(text);
  if (page) {
    const value = Number(page[1]);
    return value > 0 ? { kind: 'page', page: value } : null;
  }
  return text.length <= 120 ? { kind: 'chapter', label: text } : null;
}

/** The stored pair for a parsed end. */
export function storedPartEnd(end: PartEnd): Pick<SchedulePart, 'endKind' | 'endValue'> {
  switch (end.kind) {
    case 'page':
      return { endKind: 'page', endValue: String(end.page) };
    case 'percent':
      return { endKind: 'percent', endValue: String(end.percent) };
    case 'chapter':
      return { endKind: 'chapter', endValue: end.label };
  }
}

/** The end as stored, read back; `null` for a value that does not fit its kind. */
export function partEndOf(part: Pick<SchedulePart, 'endKind' | 'endValue'>): PartEnd | null {
  if (part.endKind === 'chapter') return part.endValue.trim() ? { kind: 'chapter', label: part.endValue.trim() } : null;
  const value = Number(part.endValue);
  if (!Number.isFinite(value) || value <= 0) return null;
  if (part.endKind === 'page') return Number.isInteger(value) ? { kind: 'page', page: value } : null;
  return value <= 100 ? { kind: 'percent', percent: value } : null;
}

/** How the end reads on the page: "to page 120", "to 45 %", "to the end of Chapter 7". */
export function describePartEnd(end: PartEnd): string {
  switch (end.kind) {
    case 'page':
      return `to page ${end.page}`;
    case 'percent':
      return `to ${end.percent} %`;
    case 'chapter':
      return `to the end of ${end.label}`;
  }
}

/** Parts in reading order: by position, then id, so every device lists them alike. */
export function orderedParts<T extends Pick<SchedulePart, 'id' | 'position'>>(parts: readonly T[]): T[] {
  return [...parts].sort((a, b) => a.position - b.position || (a.id < b.id ? -1 : a.id > b.id ? 1 : 0));
}

/** Where a part's end lies as a share of the book (0–1), when that can be known. */
export function partEndFraction(end: PartEnd, pick: PickLength): number | null {
  if (end.kind === 'percent') return end.percent / 100;
  if (end.kind === 'page' && pick.pageCount) return Math.min(1, end.page / pick.pageCount);
  return null;
}
