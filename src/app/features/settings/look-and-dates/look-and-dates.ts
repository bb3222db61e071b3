import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';

import type { Theme } from '@shared/sync/schema/collections';

import { ReaderSettings } from '../../../core/settings/reader-settings';
import { THEME_PALETTES } from '../../../core/settings/themes';
import { formatReaderDate } from '../../../core/time/format-reader-date';

/** Locales offered for dates besides the browser's own; the reader sees each as a sample date. */
const DATE_LOCALES = ['en-GB', 'en-US', 'en-CA', 'de', 'fr', 'es', 'it', 'nl', 'pt-BR', 'sv', 'pl', 'ja'];
/** The sample: a day and a time with seconds, so the reader sees none are shown. */
const SAMPLE = '2026-03-08T16:45:30Z';

/** Settings › Dates and look: the locale dates are written in and the colour theme (both synced to every device). */
@Component({
  selector: 'll-look-and-dates',
  templateUrl: './look-and-dates.html',
  styleUrl: './look-and-dates.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LookAndDates {
  protected readonly settings = inject(ReaderSettings);

  protected readonly choices = computed(() => DATE_LOCALES.map((locale) => ({ locale, sample: formatReaderDate(SAMPLE, 'dayTime', locale, 'UTC') })));
  protected readonly browserSample = computed(() => formatReaderDate(SAMPLE, 'dayTime', this.settings.browserLocale, 'UTC'));
  protected readonly today = computed(() => this.settings.format(Date.now(), 'dayTime'));

  protected readonly palettes = THEME_PALETTES;

  protected chooseTheme(theme: Theme): Promise<void> {
    return this.settings.setTheme(theme);
  }

  protected chooseLocale(value: string): Promise<void> {
    return this.settings.setDateLocale(value === '' ? null : value);
  }
}
