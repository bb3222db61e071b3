/**
 * Lower case without diacritics, so "Émile" is found by "emile": the form every search box
 * compares (library, quotes).
 *
 * @example
 * foldSearchText('Émile Zola') // 'emile zola'
 */
export function foldSearchText(text: string | null | undefined): string {
  return (text ?? '').normalize('NFD').replace(/\p{M}/gu, '').toLowerCase();
}
