// Leading quotes, brackets, dashes and the like: filing looks past them.
const LEADING_MARKS = /^[\p{P}\p{S}\s]+/u;
// English articles, only as whole words: "Theodora's Lamp" and "Anne" keep their first letter.
const LEADING_ARTICLE = /^(?:the|an|a)\s+/i;

/**
 * The letter A–Z a book files under for an alphabet challenge, or null when there is none.
 *
 * - `'title'`: a leading English article ("The", "A", "An", as a whole word) is dropped, as in
 *   library filing (ALA Filing Rules, 1980, and MARC 21 field 245's "nonfiling characters"
 *   indicator — both cited from memory). Articles of other languages ("La", "Der") are kept.
 * - `'author-surname'`: the last word of the name, e.g. 'Ada Okafor' → O. Limits: particles
 *   ("Le", "van", "de") are not looked past — 'Ines van der Berg' files under B and a surname
 *   like "Le Sueur" under S; suffixes ("Jr.") and surname-first names file under their last word.
 * - Leading punctuation is skipped, and diacritics are folded by Unicode canonical
 *   decomposition (NFD), so 'Émile' → E. Letters NFD does not split (Ø, Ł, Æ), digits and
 *   other scripts give null.
 *
 * @example
 * alphabetKey('The Quiet Orchard', 'title') // 'Q'
 * alphabetKey('Marisol Ávila', 'author-surname') // 'A'
 * alphabetKey('1947 Lanterns', 'title') // null
 */
export function alphabetKey(text: string, by: 'title' | 'author-surname'): string | null {
  let rest = text.trim();
  if (by === 'author-surname') rest = rest.split(/\s+/).pop() ?? '';
  rest = rest.replace(LEADING_MARKS, '');
  if (by === 'title') rest = rest.replace(LEADING_ARTICLE, '').replace(LEADING_MARKS, '');
  const first = rest.normalize('NFD').charAt(0).toUpperCase();
  return /^[A-Z]$/.test(first) ? first : null;
}
