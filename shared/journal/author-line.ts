/**
 * Authors as one line, as a reader would say them.
 *
 * @example
 * authorLine(['Ada Pell']) // 'Ada Pell'
 * authorLine(['A', 'B', 'C']) // 'A, B and C'
 */
export function authorLine(authors: readonly string[] | undefined): string {
  const names = (authors ?? []).map((name) => name.trim()).filter(Boolean);
  if (names.length <= 1) return names[0] ?? '';
  return `${names.slice(0, -1).join(', ')} and ${names.at(-1)}`;
}
