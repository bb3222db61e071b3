import { format } from 'date-fns';
import { de, enGB, enUS } from 'date-fns/locale';

import { type DateStyle, formatReaderDate, resolveLocale } from './format-reader-date';

const STYLES: DateStyle[] = ['day', 'longDay', 'dayMonth', 'shortDay', 'month', 'monthName', 'dayTime', 'weekdayTime', 'time'];

describe('formatReaderDate', () => {
  it('writes days and months as the locale does: the same words as date-fns with that locale (both from CLDR)', () => {
    const march8 = new Date(2026, 2, 8);

    expect(formatReaderDate('2026-03-08', 'dayMonth', 'en-GB', 'UTC')).toBe(format(march8, 'd MMMM', { locale: enGB }));
    expect(formatReaderDate('2026-03-08', 'dayMonth', 'de', 'UTC')).toBe(format(march8, 'd. MMMM', { locale: de }));
    expect(formatReaderDate('2026-03', 'month', 'en-US', 'UTC')).toBe(format(march8, 'LLLL yyyy', { locale: enUS }));
    expect(formatReaderDate('2026-03-08', 'longDay', 'en-US', 'UTC')).toBe(format(march8, 'MMMM d, yyyy', { locale: enUS }));
  });

  it('never moves a calendar day, whatever the reader’s zone', () => {
    for (const zone of ['Pacific/Kiritimati', 'America/Adak', 'Europe/Oslo']) {
      expect(formatReaderDate('2026-03-08', 'day', 'en-GB', zone)).toBe('8 Mar 2026');
    }
  });

  it('shows an instant in the reader’s zone, to the minute and never with seconds', () => {
    expect(formatReaderDate('2026-03-08T23:30:45.000Z', 'dayTime', 'en-GB', 'Europe/Oslo')).toBe('9 Mar 2026, 00:30');
    for (const style of STYLES) {
      expect(formatReaderDate('2026-03-08T16:07:45.000Z', style, 'en-GB', 'UTC'))
        .withContext(style)
        .not.toContain('45');
    }
  });

  it('gives nothing for no date or a date it cannot read', () => {
    expect(formatReaderDate(null, 'day', 'en-GB', 'UTC')).toBe('');
    expect(formatReaderDate('someday', 'day', 'en-GB', 'UTC')).toBe('');
  });
});

describe('resolveLocale', () => {
  it('takes the reader’s choice, else the browser’s locale, else English', () => {
    expect(resolveLocale('de', 'en-GB')).toBe('de');
    expect(resolveLocale(null, 'fr')).toBe('fr');
    expect(resolveLocale('zz-QQ-nonsense-x', 'qq-not-real')).toBe('en');
  });
});
