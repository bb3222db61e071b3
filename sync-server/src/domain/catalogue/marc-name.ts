import { withoutIsbdEnding } from './isbd';

/** Scripts whose personal names are written surname first, without a space. */
const SURNAME_FIRST = /[\p{Script=Han}\p{Script=Hiragana}\p{Script=Katakana}\p{Script=Hangul}]/u;

/**
 * A personal name from X00 $a in display form. The first indicator says how the name is
 * entered (MARC 21 Bibliographic, "X00 Personal Names – General Information"): 0 forename,
 * 1 surname ("Asquith, Juniper," → "Juniper Asquith"), 3 family name. Dates belong in $d, but
 * a trailing "1961-" written into $a is dropped too.
 *
 * @example
 * displayName('Asquith, Juniper, 1961-', '1') // 'Juniper Asquith'
 * displayName('Ashby, N. K.', '1')           // 'N. K. Ashby'
 */
export function displayName(value: string, ind1: string): string {
  const name = withoutIsbdEnding(value.replace(/,?\s*(?:b\.\s*|d\.\s*|ca\.\s*)?\d{3,4}\??-?(?:\d{3,4}\??)?\.?\s*$/, ''));
  if (ind1 !== '1') return name;
  const comma = name.indexOf(',');
  if (comma < 0) return name;
  const surname = name.slice(0, comma).trim();
  const forenames = withoutIsbdEnding(name.slice(comma + 1));
  if (!forenames) return surname;
  return SURNAME_FIRST.test(name) ? `${surname}${forenames}` : `${forenames} ${surname}`;
}
