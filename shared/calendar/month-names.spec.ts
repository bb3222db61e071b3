import { format } from 'date-fns';
import { de, enGB, fr } from 'date-fns/locale';

import { dayMonthText, MONTH_NAMES, monthNames, weekdayNames } from './month-names';

// Two sources outside this file: the Unicode CLDR names as the browser's ICU ships them (written
// out below), and the date-fns locale tables (an npm package with its own copy of the names).
describe('monthNames', () => {
  it('gives each month of the year in the locale, January first, the same as date-fns writes a month alone (LLLL)', () => {
    for (const locale of [enGB, fr, de]) {
      const expected = Array.from({ length: 12 }, (_, index) => format(new Date(2026, index, 15), 'LLLL', { locale }));
      expect(monthNames(locale.code!)).withContext(locale.code!).toEqual(expected);
    }
  });

  it('writes CLDR names: mars in French, März in German, 3月 in Japanese, short names for chart axes', () => {
    expect(monthNames('fr-FR')[2]).toBe('mars');
    expect(monthNames('de-DE')[2]).toBe('März');
    expect(monthNames('ja-JP')[2]).toBe('3月');
    expect(monthNames('en-US', 'short')).toEqual(['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec']);
    expect(monthNames('en')).toEqual([...MONTH_NAMES]);
  });
});

describe('weekdayNames', () => {
  it('starts on Monday (ISO 8601) and matches date-fns (EEEE, EEEEE)', () => {
    for (const locale of [enGB, fr, de]) {
      // 2026-01-05 is a Monday.
      const days = Array.from({ length: 7 }, (_, index) => new Date(2026, 0, 5 + index));
      expect(weekdayNames(locale.code!))
        .withContext(locale.code!)
        .toEqual(days.map((day) => format(day, 'EEEE', { locale })));
      expect(weekdayNames(locale.code!, 'narrow'))
        .withContext(locale.code!)
        .toEqual(days.map((day) => format(day, 'EEEEE', { locale })));
    }
    expect(weekdayNames('en-GB', 'narrow')).toEqual(['M', 'T', 'W', 'T', 'F', 'S', 'S']);
    expect(weekdayNames('fr-FR')[0]).toBe('lundi');
  });
});

describe('dayMonthText', () => {
  it('orders day and month as the locale does (CLDR): 14 March, March 14, 14. März, 14 mars', () => {
    expect(dayMonthText('2026-03-14', 'en-GB')).toBe('14 March');
    expect(dayMonthText('2026-03-14', 'en-US')).toBe('March 14');
    expect(dayMonthText('2026-03-14', 'de-DE')).toBe('14. März');
    expect(dayMonthText('2026-03-14', 'fr-FR')).toBe('14 mars');
  });

  it('never shifts a day, whatever the device zone (the day is drawn in UTC)', () => {
    expect(dayMonthText('2026-01-01', 'en-GB')).toBe('1 January');
    expect(dayMonthText('2026-12-31', 'en-GB')).toBe('31 December');
  });
});
