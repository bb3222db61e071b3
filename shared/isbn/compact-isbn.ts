/**
 * Drops the hyphens and spaces that people and catalogues put between the parts of an ISBN,
 * and upper-cases an ISBN-10 `x` check character. Nothing else is changed, so a stray letter
 * still makes the result invalid.
 *
 * @example
 * compactIsbn('0-8436-1072-7') // '0843610727'
 * compactIsbn('0 8044 2957 x') // '080442957X'
 */
export function compactIsbn(input: string): string {
  return input.replace(/[\s-]/g, '').toUpperCase();
}
