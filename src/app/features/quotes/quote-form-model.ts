import { formatAudioPosition, parseAudioPosition } from '@shared/journal/audio-position';
import type { PatchOf } from '@shared/sync/schema/collection';
import type { Book, Quote, quotes } from '@shared/sync/schema/collections';
import { optionalText, splitList } from '@shared/text/form-text';

/** The book's format decides what the position field means; a quote with no book counts pages. */
export type PositionFormat = NonNullable<Book['format']>;

/** The capture dialog's form values: text where the reader types text. */
export interface QuoteFormValue {
  /** '' for no book. */
  bookId: string;
  text: string;
  /** A page, an ebook location or percent, or an audio position (h:mm:ss), by the book's format. */
  position: string;
  chapter: string;
  note: string;
  tags: string;
  labelIds: readonly string[];
  favourite: boolean;
}

export const EMPTY_QUOTE_FORM: QuoteFormValue = {
  bookId: '',
  text: '',
  position: '',
  chapter: '',
  note: '',
  tags: '',
  labelIds: [],
  favourite: false,
};

/** The most tags a quote keeps, and the longest tag (the `quotes` schema). */
export const MAX_TAGS = 40;
export const MAX_TAG_LENGTH = 60;
const MAX_PAGE = 100_000;
const MAX_LOCATION_LENGTH = 40;

/** What the position field is called for each format. */
export const POSITION_LABELS: Record<PositionFormat, string> = {
  print: 'Page',
  ebook: 'Location or percent',
  audiobook: 'Audio position',
};

/** A stored quote as form values, its position written in the unit of `format`. */
export function toQuoteForm(quote: Quote, format: PositionFormat): QuoteFormValue {
  return {
    bookId: quote.bookId ?? '',
    text: quote.text ?? '',
    position: positionText(quote, format),
    chapter: quote.chapter ?? '',
    note: quote.note ?? '',
    tags: (quote.tags ?? []).join(', '),
    labelIds: [...(quote.labelIds ?? [])],
    favourite: quote.favourite ?? false,
  };
}

function positionText(quote: Quote, format: PositionFormat): string {
  const page = quote.page != null ? String(quote.page) : '';
  const location = quote.ebookLocation ?? '';
  const audio = quote.audioSeconds != null ? formatAudioPosition(quote.audioSeconds) : '';
  const byFormat = { print: page, ebook: location, audiobook: audio }[format];
  // A quote kept while its book had another format still shows where it was.
  return byFormat || page || location || audio;
}

/** Why the typed position does not fit the format, in the reader's words; `null` when it fits. */
export function positionError(position: string, format: PositionFormat): string | null {
  const typed = position.trim();
  if (!typed) return null;
  if (format === 'audiobook') return parseAudioPosition(typed) === null ? 'Use h:mm:ss such as 1:02:30, or minutes such as 45' : null;
  if (format === 'ebook') return typed.length > MAX_LOCATION_LENGTH ? `Use at most ${MAX_LOCATION_LENGTH} characters` : null;
  return /^\d{1,6}$/.test(typed) && Number(typed) <= MAX_PAGE ? null : 'Use a page number such as 42';
}

/**
 * A warning, not an error, for a page past the book's page count: editions differ, so the
 * reader may keep it after saying so. `null` when the page fits or nothing is known to compare.
 */
export function pageBeyondBook(position: string, format: PositionFormat, pageCount: number | null | undefined): string | null {
  const typed = position.trim();
  if (format !== 'print' || pageCount == null || !/^\d{1,6}$/.test(typed) || Number(typed) <= pageCount) return null;
  return `Your copy of this book has ${pageCount} pages, so page ${Number(typed)} is past its end. Editions differ: press Save again to keep it.`;
}

/** Why the tags do not fit, or `null`. */
export function tagsError(tags: string): string | null {
  const list = splitList(tags);
  if (list.length > MAX_TAGS) return `Use at most ${MAX_TAGS} tags`;
  if (list.some((tag) => tag.length > MAX_TAG_LENGTH)) return `Keep each tag to ${MAX_TAG_LENGTH} characters`;
  return null;
}

/**
 * Form values as field values. The position goes to the one field of the book's format and the
 * other two are cleared, so a quote never holds two positions that disagree.
 */
export function toQuoteFields(value: QuoteFormValue, format: PositionFormat): PatchOf<typeof quotes> {
  const typed = value.position.trim();
  return {
    bookId: value.bookId || null,
    text: value.text.trim(),
    page: format === 'print' && typed ? Number(typed) : null,
    ebookLocation: format === 'ebook' && typed ? typed : null,
    audioSeconds: format === 'audiobook' && typed ? parseAudioPosition(typed) : null,
    chapter: optionalText(value.chapter),
    note: optionalText(value.note),
    tags: splitList(value.tags),
    labelIds: [...value.labelIds],
    favourite: value.favourite,
  };
}

/**
 * Only the fields the reader changed, so edits made meanwhile on other devices are kept. When
 * the position or its unit changed, all three position fields are sent, so the old one is
 * cleared; the store skips those that already hold the value.
 */
export function changedQuoteFields(
  before: QuoteFormValue,
  beforeFormat: PositionFormat,
  after: QuoteFormValue,
  afterFormat: PositionFormat,
): PatchOf<typeof quotes> {
  const old = toQuoteFields(before, beforeFormat);
  const next = toQuoteFields(after, afterFormat);
  const positionChanged = before.position.trim() !== after.position.trim() || beforeFormat !== afterFormat;
  return Object.fromEntries(
    Object.entries(next).filter(([field, value]) =>
      POSITION_FIELDS.includes(field) ? positionChanged : JSON.stringify(value) !== JSON.stringify(old[field as keyof typeof old]),
    ),
  ) as PatchOf<typeof quotes>;
}

const POSITION_FIELDS: readonly string[] = ['page', 'ebookLocation', 'audioSeconds'];
