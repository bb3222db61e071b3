/** A genre or tag and how many books carry it. */
export interface TermCount {
  /** As the reader first wrote it. */
  readonly term: string;
  readonly count: number;
}

/** The most used terms and how many books carry only less used ones. */
export interface TopTerms {
  readonly top: readonly TermCount[];
  /** Distinct terms left out of `top`. */
  readonly otherTerms: number;
}

/**
 * The terms (genres or tags) used most across books, most used first, ties in alphabetical
 * order. Spellings that differ only in case or surrounding spaces are one term ("Sea stories",
 * "sea stories "), shown as first written; a book counts once per term.
 *
 * @param lists one list per book.
 * @example
 * topTerms([['Fantasy', 'Sea'], ['fantasy'], ['Poetry']], 2)
 * // { top: [{ term: 'Fantasy', count: 2 }, { term: 'Poetry', count: 1 }], otherTerms: 1 }
 */
export function topTerms(lists: readonly (readonly string[] | null | undefined)[], limit: number): TopTerms {
  if (!Number.isInteger(limit) || limit < 1) throw new RangeError(`Limit must be a whole number from 1: ${limit}`);
  const byKey = new Map<string, { term: string; count: number }>();
  for (const list of lists) {
    const keys = new Set<string>();
    for (const raw of list ?? []) {
      const term = raw.trim();
      const key = term.toLocaleLowerCase('en');
      if (term === '' || keys.has(key)) continue;
      keys.add(key);
      const entry = byKey.get(key) ?? { term, count: 0 };
      entry.count += 1;
      byKey.set(key, entry);
    }
  }
  const ranked = [...byKey.values()].sort((a, b) => b.count - a.count || a.term.localeCompare(b.term, 'en', { sensitivity: 'base' }));
  return { top: ranked.slice(0, limit), otherTerms: Math.max(0, ranked.length - limit) };
}
