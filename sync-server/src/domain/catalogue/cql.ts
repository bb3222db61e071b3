/**
 * A CQL term in double quotes, with `"`, `\` and the masking characters `*`, `?`, `^` escaped by a backslash (CQL 1.2, "Quoting"),
 * so a reader's words never change the query's structure.
 *
 * @example
 * cqlTerm('The "Lantern" Years') // '"The \\"Lantern\\" Years"'
 */
export function cqlTerm(words: string): string {
  return `"${words.replace(/[\\"*?^]/g, (c) => `\\${c}`)}"`;
}
