import { computed, inject, Injectable, InjectionToken } from '@angular/core';

import { deterministicId } from '@shared/sync/deterministic-id';
import type { ReaderSettings as ReaderSettingsRow, Theme } from '@shared/sync/schema/collections';

import { JournalStore } from '../data/journal-store';
import { liveQuerySignal } from '../data/live-query';
import { type DateStyle, formatReaderDate, resolveLocale } from '../time/format-reader-date';
import { TIME_ZONE } from '../time/time-zone';

/** The reader's one settings row. */
export const READER_SETTINGS_ID = deterministicId('reader-settings', 'current');

/** The browser's preferred locale: the default for dates until the reader chooses one. */
export const BROWSER_LOCALE = new InjectionToken<string>('BROWSER_LOCALE', {
  providedIn: 'root',
  factory: () => navigator.languages?.[0] ?? navigator.language ?? 'en',
});

/** The reader's settings that sync to every device (date locale, colour theme), and the one date formatter. */
@Injectable({ providedIn: 'root' })
export class ReaderSettings {
  private readonly store = inject(JournalStore);
  private readonly timeZone = inject(TIME_ZONE);
  readonly browserLocale = inject(BROWSER_LOCALE);
  private readonly row = liveQuerySignal((db) => db.rows('readerSettings').get(READER_SETTINGS_ID) as Promise<ReaderSettingsRow | undefined>, undefined);

  /** What the reader chose, or null to follow the browser. */
  readonly chosenLocale = computed(() => this.row()?.dateLocale ?? null);
  /** The locale dates are written in. */
  readonly locale = computed(() => resolveLocale(this.chosenLocale(), this.browserLocale));
  readonly theme = computed<Theme>(() => this.row()?.theme ?? 'system');

  /** A date as the reader reads it (see `formatReaderDate`); reading it in a template follows a change of locale. */
  format(value: string | number | Date | null | undefined, style: DateStyle = 'day'): string {
    return formatReaderDate(value, style, this.locale(), this.timeZone);
  }

  setDateLocale(locale: string | null): Promise<void> {
    return this.store.write('readerSettings', READER_SETTINGS_ID, { dateLocale: locale });
  }

  setTheme(theme: Theme): Promise<void> {
    return this.store.write('readerSettings', READER_SETTINGS_ID, { theme });
  }
}
