import { gs1CheckDigit } from '../../../shared/isbn/gs1-check-digit';
import { isbn10CheckDigit } from '../../../shared/isbn/isbn10-check-digit';
import hardCases from './hard-cases.json';
import { field008, leader, type LocalRecord, type MarcField } from './marc-fields';

/*
 * The local catalogue's records: invented books by invented people from invented publishers,
 * generated from a fixed seed so every run (and every spec) sees the same catalogue.
 */

const GIVEN = [
  'Juniper',
  'Odile',
  'Halvard',
  'Ines',
  'Tamsin',
  'Bartholomew',
  'Marisol',
  'Caspian',
  'Wren',
  'Ottoline',
  'Emrys',
  'Saoirse',
  'Lucan',
  'Perpetua',
  'Ferris',
  'Ilse',
  'Ansel',
  'Clementine',
  'Dashiell',
  'Morwenna',
];
const SURNAMES = [
  'Asquith',
  'Marchetti',
  'Nyström',
  'Quist',
  'Roa',
  'Pellingham',
  'Vantongeren',
  'Oyelaran',
  'Thistlewood',
  'Brannagh',
  'Castellane',
  'Weatherby',
  'Lindqvist',
  'Okonkwo-Hale',
  'Fairweather',
  'Duvernoy',
  'Abernethy',
  'Szabóné',
  'Kettleburn',
  'Moravec',
];
const ADJECTIVES = [
  'Quiet',
  'Drowned',
  'Lantern-lit',
  'Salt',
  'Borrowed',
  'Winter',
  'Small',
  'Crooked',
  'Amber',
  'Far',
  'Hollow',
  'Gilded',
  'Patient',
  'Tidal',
  'Last',
];
const NOUNS = [
  'Orchard',
  'Harbour',
  'Cartographer',
  'Staircase',
  'Almanac',
  'Beekeeper',
  'Observatory',
  'Ferry',
  'Glasshouse',
  'Archivist',
  'Meadow',
  'Lighthouse',
  'Inheritance',
  'Weir',
  'Telegraph',
];
const SUBTITLES = ['a novel', 'stories', 'a year on the coast', 'notes from a small island', 'a field guide', 'an essay in twelve walks', null, null, null];
const PUBLISHERS = ['Lanternfield Press', 'Quayside Books', 'Mossgate Editions', 'Tidewrack Press', 'Underhill Lane', 'Kestrel & Vane'];
const PLACES = ['Porthallow', 'Eastmere', 'Kilbrannan', 'Lowater'];
const SUBJECTS = [
  'Coastal life',
  'Families',
  'Gardens',
  'Friendship',
  'Islands',
  'Grief',
  'Letters',
  'Astronomy',
  'Bees',
  'Maps',
  'Rivers',
  'Ghost stories',
  'Detective and mystery stories',
  'Nature writing',
];
const LANGUAGES = ['eng', 'eng', 'eng', 'eng', 'fre', 'ger', 'spa', 'ita'];

/** mulberry32: a small seeded generator, so the catalogue is the same on every machine. */
function seeded(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** An ISBN-13 of the invented registrant 978-1-99990: nine digits of body, then the GS1 check digit. */
export function inventedIsbn13(serial: number): string {
  const body = `97819999${String(serial).padStart(4, '0')}`;
  return body + gs1CheckDigit(body);
}

/** An ISBN-10 (group 1, invented registrant 99998). */
export function inventedIsbn10(serial: number): string {
  const body = `199998${String(serial).padStart(3, '0')}`;
  return body + isbn10CheckDigit(body);
}

const isbnField = (isbn: string, qualifier?: string): MarcField => ['020', '  ', 'a', qualifier ? `${isbn} (${qualifier})` : isbn];
const authorField = (surname: string, given: string, dates?: string): MarcField =>
  dates ? ['100', '1 ', 'a', `${surname}, ${given},`, 'd', dates] : ['100', '1 ', 'a', `${surname}, ${given}.`];
const titleField = (title: string, subtitle: string | null, responsibility: string): MarcField =>
  subtitle ? ['245', '10', 'a', `${title} :`, 'b', `${subtitle} /`, 'c', `${responsibility}.`] : ['245', '10', 'a', `${title} /`, 'c', `${responsibility}.`];
const published = (place: string, publisher: string, year: number): MarcField => ['264', ' 1', 'a', `${place} :`, 'b', `${publisher},`, 'c', `${year}.`];

/** The hard cases named in the issue, each a record of its own (in hard-cases.json) with ISBNs specs can look up. */
export const HARD_CASES = {
  /** Catalogued before 2007: only an ISBN-10, no 264 but a 260, extent in "p.". */
  isbn10Only: { isbn10: inventedIsbn10(1) },
  /** $a with a qualifier written after the number, and another in $q. */
  qualified: { isbn13: inventedIsbn13(9001), otherIsbn13: inventedIsbn13(9002) },
  /** Hardback, paperback and ebook ISBNs in three 020 fields. */
  severalIsbns: { hardback: inventedIsbn13(9011), paperback: inventedIsbn13(9012), ebook: inventedIsbn13(9013) },
  /** "Asquith, Juniper, 1961-" with a co-author and a translator in 700s. */
  datedNames: { isbn13: inventedIsbn13(9021) },
  /** Titles in Japanese, Russian and Greek. */
  nonLatin: { japanese: inventedIsbn13(9031), russian: inventedIsbn13(9032), greek: inventedIsbn13(9033) },
  /** An audiobook on one disc, 9 hr. 15 min. */
  audiobook: { isbn13: inventedIsbn13(9041) },
  /** Book 2 of a series, with 490 and 830. */
  seriesEntry: { isbn13: inventedIsbn13(9051) },
  /** An ebook: "1 online resource (xii, 345 pages)". */
  ebook: { isbn13: inventedIsbn13(9061) },
} as const;

/** A hard case as hard-cases.json writes it: the 008 and the leader are built here like every other record's. */
interface HardCaseEntry {
  readonly typeOfRecord: 'a' | 'i';
  readonly year: number;
  readonly language: string;
  readonly formOfItem?: string;
  readonly fields: readonly MarcField[];
}

function hardCaseRecords(): LocalRecord[] {
  return (hardCases as readonly HardCaseEntry[]).map(({ typeOfRecord, year, language, formOfItem, fields }) => ({
    leader: leader(typeOfRecord),
    fields: [['008', field008(year, language, formOfItem)], ...fields],
  }));
}

function generatedRecord(index: number, random: () => number): LocalRecord {
  const pick = <T>(items: readonly T[]) => items[Math.floor(random() * items.length)]!;
  const given = pick(GIVEN);
  const surname = pick(SURNAMES);
  const title = `The ${pick(ADJECTIVES).toLowerCase()} ${pick(NOUNS).toLowerCase()}`;
  const subtitle = pick(SUBTITLES);
  const year = 1990 + Math.floor(random() * 36);
  const audio = index % 17 === 0;
  const fields: MarcField[] = [
    ['001', `llc-${String(index).padStart(4, '0')}`],
    ['008', field008(year, pick(LANGUAGES))],
    isbnField(inventedIsbn13(index), index % 3 === 0 ? 'pbk.' : undefined),
    authorField(surname, given, index % 5 === 0 ? `${1930 + (index % 60)}-` : undefined),
    titleField(
      title.replace(/^the (\w)/, (_, c: string) => `The ${c}`),
      subtitle,
      `${given} ${surname}`,
    ),
    published(pick(PLACES), pick(PUBLISHERS), year),
    audio
      ? ['300', '  ', 'a', `1 audio disc (${3 + (index % 12)} hr., ${index % 60} min.)`]
      : ['300', '  ', 'a', `${index % 4 === 0 ? 'x, ' : ''}${120 + Math.floor(random() * 500)} pages ;`, 'c', '21 cm'],
    ['650', ' 0', 'a', `${pick(SUBJECTS)}.`],
  ];
  if (index % 7 === 0) fields.push(['490', '0 ', 'a', `${pick(NOUNS)} chronicles ;`, 'v', `${1 + (index % 5)}`]);
  if (index % 4 === 1) fields.push(['520', '  ', 'a', `An invented book about ${pick(SUBJECTS).toLowerCase()}, kept in Lamplight's local catalogue.`]);
  return { leader: leader(audio ? 'i' : 'a'), fields };
}

/** The whole local catalogue: the hard cases, then 300 generated records. */
export function inventedRecords(count = 300): LocalRecord[] {
  const random = seeded(0x1a3b);
  const records = [...hardCaseRecords(), ...Array.from({ length: count }, (_, i) => generatedRecord(i + 1, random))];
  // Fields in tag order, as catalogues keep them (a stable sort keeps repeated fields in order).
  return records.map((record) => ({ ...record, fields: [...record.fields].sort((a, b) => a[0]!.localeCompare(b[0]!)) }));
}
