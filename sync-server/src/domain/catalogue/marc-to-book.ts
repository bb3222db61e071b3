import type { CatalogueBook, CatalogueFormat } from '../../../../shared/api/catalogue';
import { normalizeIsbn } from '../../../../shared/isbn/normalize-isbn';
import { withoutBrackets, withoutIsbdEnding } from './isbd';
import { parseExtent, playingTimeMinutes } from './marc-extent';
import { languageTag } from './marc-language';
import { displayName } from './marc-name';
import { controlField, subfield, subfieldValues, type MarcDataField, type MarcRecord } from './marc-record';

/** 700 relators that make a name an author of the book rather than a narrator or translator. */
const AUTHOR_RELATORS = new Set(['author', 'aut', 'joint author', 'co-author']);
const MAX_SUBJECTS = 8;

const fields = (record: MarcRecord, tag: string) => record.dataFields.filter((field) => field.tag === tag);
const clean = (value: string | undefined) => (value === undefined ? null : withoutIsbdEnding(value) || null);
const firstNumber = (value: string | undefined) => {
  const match = /\d+(?:\.\d+)?/.exec(value ?? '');
  return match ? Number(match[0]) : null;
};

/**
 * Every valid ISBN of 020 $a as ISBN-13 digits, in order and once each. $a may carry a
 * qualifier after the number ("0843610727 (pbk.)"); $z (cancelled or invalid) is not read.
 */
export function isbnsOf(record: MarcRecord): string[] {
  const found = subfieldValues(record, '020', 'a')
    .map((value) => /^\s*([0-9][0-9\- ]*[0-9Xx])/.exec(value)?.[1])
    .map((candidate) => (candidate ? normalizeIsbn(candidate) : null))
    .filter((isbn): isbn is string => isbn !== null);
  return [...new Set(found)];
}

function authorsOf(record: MarcRecord): string[] {
  const isAuthor = (field: MarcDataField) => {
    const relators = [...field.subfields.filter((s) => s.code === 'e' || s.code === '4').map((s) => withoutIsbdEnding(s.value).toLowerCase())];
    return relators.length === 0 || relators.some((relator) => AUTHOR_RELATORS.has(relator));
  };
  const names = [...fields(record, '100'), ...fields(record, '700').filter(isAuthor)]
    .map((field) => ({ a: subfield(field, 'a'), ind1: field.ind1 }))
    .filter((name): name is { a: string; ind1: string } => !!name.a)
    .map((name) => displayName(name.a, name.ind1));
  return [...new Set(names.filter(Boolean))];
}

function titleOf(record: MarcRecord): { title: string; subtitle: string | null } {
  const field = fields(record, '245')[0];
  if (!field) return { title: '', subtitle: null };
  const parts = field.subfields.filter((s) => s.code === 'n' || s.code === 'p').map((s) => withoutIsbdEnding(s.value));
  const title = [withoutIsbdEnding(subfield(field, 'a') ?? ''), ...parts].filter(Boolean).join('. ');
  return { title, subtitle: clean(subfield(field, 'b')) };
}

/** Publication (264 second indicator 1), else the older 260, else copyright (264 _4), else 008/07-10. */
function publicationOf(record: MarcRecord): { publisher: string | null; year: number | null } {
  const published = fields(record, '264').find((field) => field.ind2 === '1') ?? fields(record, '260')[0];
  const copyright = fields(record, '264').find((field) => field.ind2 === '4');
  const publisherText = published && subfield(published, 'b');
  const yearText = (published && subfield(published, 'c')) ?? (copyright && subfield(copyright, 'c')) ?? controlField(record, '008')?.slice(7, 11);
  const year = /\d{4}/.exec(yearText ?? '')?.[0];
  return { publisher: publisherText ? withoutBrackets(withoutIsbdEnding(publisherText)) || null : null, year: year ? Number(year) : null };
}

/**
 * Leader/06 "i" is a nonmusical sound recording (an audiobook); a text that is online
 * (008/23 "o" or "s", 338 "online resource", or a 300 of "online resource") is an ebook.
 */
function formatOf(record: MarcRecord): CatalogueFormat {
  if (record.leader[6] === 'i') return 'audiobook';
  const formOfItem = controlField(record, '008')?.[23];
  const online =
    formOfItem === 'o' ||
    formOfItem === 's' ||
    subfieldValues(record, '338', 'a').some((value) => /online resource/i.test(value)) ||
    subfieldValues(record, '300', 'a').some((value) => /online resource/i.test(value));
  return online ? 'ebook' : 'print';
}

/** Controlled series entries (830, 800) first, else the series statement as printed (490). */
function seriesOf(record: MarcRecord): { series: string | null; seriesPosition: number | null } {
  const controlled = fields(record, '830')[0] ?? fields(record, '800')[0];
  if (controlled) {
    const name = controlled.tag === '800' ? subfield(controlled, 't') : subfield(controlled, 'a');
    if (name) return { series: clean(name), seriesPosition: firstNumber(subfield(controlled, 'v')) };
  }
  const statement = fields(record, '490')[0];
  if (!statement) return { series: null, seriesPosition: null };
  return { series: clean(subfield(statement, 'a')), seriesPosition: firstNumber(subfield(statement, 'v')) };
}

/**
 * A MARC 21 bibliographic record as a book's fields (MARC 21 Format for Bibliographic Data:
 * 020, 041, 100/700, 245, 250, 260/264, 300/306, 490/800/830, 520, 650/655, leader, 008).
 * `lookedUp` (ISBN-13 digits) picks which of several ISBNs is the book's.
 */
export function marcToBook(record: MarcRecord, lookedUp?: string): CatalogueBook {
  const isbns = isbnsOf(record);
  const format = formatOf(record);
  const extent = parseExtent(subfieldValues(record, '300', 'a').join(' '));
  const playingTime =
    subfieldValues(record, '306', 'a')
      .map(playingTimeMinutes)
      .find((minutes) => minutes !== null) ?? null;
  const subjects = [...subfieldValues(record, '650', 'a'), ...subfieldValues(record, '655', 'a')].map((value) => withoutIsbdEnding(value)).filter(Boolean);
  const summary = fields(record, '520')[0];
  return {
    isbn: lookedUp && isbns.includes(lookedUp) ? lookedUp : (isbns[0] ?? null),
    isbns,
    ...titleOf(record),
    authors: authorsOf(record),
    edition: withoutIsbdEnding(subfieldValues(record, '250', 'a')[0] ?? '', true) || null,
    ...publicationOf(record),
    format,
    pageCount: format === 'audiobook' ? null : extent.pages,
    audioMinutes: format === 'audiobook' ? (extent.minutes ?? playingTime) : null,
    ...seriesOf(record),
    language: languageTag(subfieldValues(record, '041', 'a')[0]) ?? languageTag(controlField(record, '008')?.slice(35, 38)),
    subjects: [...new Set(subjects)].slice(0, MAX_SUBJECTS),
    summary: summary ? [subfield(summary, 'a'), subfield(summary, 'b')].filter(Boolean).join(' ').trim() || null : null,
  };
}
