/** A day written as an ISO 8601 week date: week-numbering year, week 1–53, weekday 1 (Mon)–7 (Sun). */
export interface IsoWeekDate {
  readonly year: number;
  readonly week: number;
  readonly weekday: number;
}

/** One ISO 8601 week of a week-numbering year, with its first and last calendar dates. */
export interface IsoWeekSpan {
  readonly year: number;
  readonly week: number;
  /** 'YYYY-MM-DD' of the Monday that opens the week. */
  readonly monday: string;
  /** 'YYYY-MM-DD' of the Sunday that closes it. */
  readonly sunday: string;
}
