import { monthNames, weekdayNames } from '../calendar/month-names';

/** What a new page is about, for filling a template's placeholders. */
export interface TemplateContext {
  /** The reader's calendar date today, 'YYYY-MM-DD' (ISO 8601). */
  readonly today: string;
  /** The title of the book the notebook is attached to, if any. */
  readonly bookTitle?: string | null;
  /** The authors of that book, if any. */
  readonly bookAuthors?: readonly string[] | null;
  /** The notebook's own title. */
  readonly notebookTitle?: string | null;
  /** The reader's date locale for `{{weekday}}` and `{{month}}` (BCP 47; English when absent). */
  readonly locale?: string;
}

/** The text a template gives a page: what the page starts with. */
export interface TemplateText {
  readonly title?: string | null;
  readonly body?: string | null;
}

/** The page a template starts, with its placeholders filled. */
export interface InstantiatedPage {
  readonly title: string;
  readonly body: string;
}

/** Every placeholder a template may hold, with what it becomes (shown to the reader as help). */
export const TEMPLATE_PLACEHOLDERS = [
  { name: 'date', about: 'today’s date, like 2026-03-08' },
  { name: 'weekday', about: 'today’s weekday, like Sunday' },
  { name: 'month', about: 'this month’s name, like March' },
  { name: 'year', about: 'this year, like 2026' },
  { name: 'book', about: 'the notebook’s book title (empty without a book)' },
  { name: 'author', about: 'that book’s authors (empty without a book)' },
  { name: 'notebook', about: 'the notebook’s title' },
] as const;

export type PlaceholderName = (typeof TEMPLATE_PLACEHOLDERS)[number]['name'];

const DATE = /^(\d{4})-(0[1-9]|1[0-2])-(0[1-9]|[12]\d|3[01])$/;
// `{{date}}`, `{{ Date }}`: letters only, spaces allowed inside the braces.
const PLACEHOLDER = /\{\{\s*([A-Za-z]+)\s*\}\}/g;

/**
 * The value of every placeholder for a context.
 *
 * @throws RangeError when `today` is not a real 'YYYY-MM-DD' date.
 */
export function placeholderValues(context: TemplateContext): Record<PlaceholderName, string> {
  const match = DATE.exec(context.today);
  const [year, month, day] = match ? [Number(match[1]), Number(match[2]), Number(match[3])] : [NaN, NaN, NaN];
  const instant = new Date(Date.UTC(year, month - 1, day));
  // Date.UTC rolls 2026-02-30 over into March; a real date comes back as it went in.
  if (!match || instant.getUTCFullYear() !== year || instant.getUTCMonth() !== month - 1 || instant.getUTCDate() !== day) {
    throw new RangeError(`Not a calendar date like 2026-03-08: ${context.today}`);
  }
  return {
    date: context.today,
    // Monday first, so Sunday (getUTCDay 0) is the last.
    weekday: weekdayNames(context.locale ?? 'en')[(instant.getUTCDay() + 6) % 7]!,
    month: monthNames(context.locale ?? 'en')[month - 1]!,
    year: match[1]!,
    book: context.bookTitle ?? '',
    author: (context.bookAuthors ?? []).join(', '),
    notebook: context.notebookTitle ?? '',
  };
}

/**
 * A new page's text from a template: each known placeholder (see {@link TEMPLATE_PLACEHOLDERS};
 * names are case-insensitive, spaces inside the braces are fine) is replaced in one pass, so a
 * book title that itself holds `{{date}}` is left alone. Unknown placeholders stay as typed.
 * Values go in as they are (a title with `*` in it may read as emphasis in the body).
 *
 * @throws RangeError when `context.today` is not a real 'YYYY-MM-DD' date.
 * @example
 * instantiateTemplate({ title: '{{book}} · {{weekday}}', body: 'Read on {{date}}. {{mood}}' },
 *   { today: '2026-03-08', bookTitle: 'Salt Roads' })
 * // { title: 'Salt Roads · Sunday', body: 'Read on 2026-03-08. {{mood}}' }
 */
export function instantiateTemplate(template: TemplateText, context: TemplateContext): InstantiatedPage {
  const values = placeholderValues(context);
  const fill = (text: string | null | undefined) =>
    (text ?? '').replace(PLACEHOLDER, (typed, name: string) => {
      const key = name.toLowerCase();
      return Object.hasOwn(values, key) ? values[key as PlaceholderName] : typed;
    });
  return { title: fill(template.title), body: fill(template.body) };
}
