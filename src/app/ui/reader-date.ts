import { inject, Pipe, type PipeTransform } from '@angular/core';

import { ReaderSettings } from '../core/settings/reader-settings';
import type { DateStyle } from '../core/time/format-reader-date';

/**
 * Every date a reader reads goes through this pipe: their locale (chosen in Settings, else the
 * browser's), never seconds. Impure so a change of locale redraws it; the formatters are cached.
 *
 * @example
 * {{ book.finishedOn | readerDate: 'dayMonth' }}
 */
@Pipe({ name: 'readerDate', pure: false })
export class ReaderDatePipe implements PipeTransform {
  private readonly settings = inject(ReaderSettings);

  transform(value: string | number | Date | null | undefined, style: DateStyle = 'day'): string {
    return this.settings.format(value, style);
  }
}
