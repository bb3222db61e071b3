/**
 * MARC language codes (the Library of Congress "MARC Code List for Languages", bibliographic
 * forms) of languages with a two-letter ISO 639-1 code, as the tags the book editor accepts.
 * Codes not listed stay as they are: most are also valid three-letter language tags.
 */
const TWO_LETTER: Record<string, string> = {
  ara: 'ar',
  chi: 'zh',
  cze: 'cs',
  dan: 'da',
  dut: 'nl',
  eng: 'en',
  est: 'et',
  fin: 'fi',
  fre: 'fr',
  ger: 'de',
  gle: 'ga',
  gre: 'el',
  heb: 'he',
  hin: 'hi',
  hun: 'hu',
  ice: 'is',
  ita: 'it',
  jpn: 'ja',
  kor: 'ko',
  lat: 'la',
  lit: 'lt',
  nor: 'no',
  per: 'fa',
  pol: 'pl',
  por: 'pt',
  rum: 'ro',
  rus: 'ru',
  spa: 'es',
  swe: 'sv',
  tur: 'tr',
  ukr: 'uk',
  wel: 'cy',
  baq: 'eu',
  cat: 'ca',
  geo: 'ka',
  arm: 'hy',
  mac: 'mk',
  may: 'ms',
  slo: 'sk',
  tib: 'bo',
};

/** Codes that name no language: undetermined, no linguistic content, multiple, blank or fill. */
const NO_LANGUAGE = new Set(['und', 'zxx', 'mul', '   ', '|||', '']);

/** A MARC language code (041 $a, 008/35-37) as a language tag, or null when it names none. */
export function languageTag(marcCode: string | undefined): string | null {
  const code = (marcCode ?? '').slice(0, 3).toLowerCase();
  if (NO_LANGUAGE.has(code) || !/^[a-z]{3}$/.test(code)) return null;
  return TWO_LETTER[code] ?? code;
}
