import { ChangeDetectionStrategy, Component, computed, ElementRef, inject, input, signal, viewChild } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';

import { yearReview } from '@shared/insights/year-review';
import { type ShelfSpine, yearShelf } from '@shared/insights/year-shelf';
import { deterministicId } from '@shared/sync/deterministic-id';

import { Auth } from '../../../core/auth/auth';
import { ReaderSettings } from '../../../core/settings/reader-settings';
import { goalAmount } from '../../../ui/goal-figures';
import { insightsYear } from '../insights-year';
import { saveAsPng } from './save-as-png';
import { shelfWords, titleAndAuthors } from './shelf-words';

const FORMAT_WORDS = { print: 'print', ebook: 'ebook', audiobook: 'audiobook' } as const;

/**
 * The year's shelf: every book finished in the year as a spine (taller for a longer book, coloured
 * and patterned by format, in the order finished), a few sentences about the year, savable as a
 * PNG image to keep or share.
 */
@Component({
  selector: 'll-year-review',
  imports: [RouterLink, MatButtonModule, MatIconModule],
  templateUrl: './year-review.html',
  styleUrl: './year-review.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class YearReview {
  /** The year from the route ('2026'). */
  readonly year = input<string>();

  private readonly data = insightsYear(this.year);
  private readonly card = viewChild<ElementRef<HTMLElement>>('card');
  protected readonly loaded = this.data.loaded;
  protected readonly shownYear = this.data.year;
  protected readonly log = this.data.record.log;
  private readonly auth = inject(Auth);
  protected readonly readerName = computed(() => this.auth.user()?.displayName ?? null);
  protected readonly saving = signal(false);
  protected readonly saveMessage = signal<string | null>(null);

  protected readonly review = computed(() => {
    const year = this.shownYear() ?? 0;
    const record = this.data.record;
    const planId = deterministicId('year-plan', String(year));
    const bestBookId = record.rows()?.yearPlans.find((plan) => plan.id === planId)?.bestBookId;
    return yearReview({ year, today: record.today, finished: record.finished(), books: record.bookById(), log: this.log(), bestBookId });
  });
  private readonly dates = inject(ReaderSettings);
  protected readonly spines = computed(() => yearShelf(this.data.record.finished(), this.data.record.bookById(), this.shownYear() ?? 0));
  protected readonly words = computed(() => shelfWords(this.shownYear() ?? 0, this.review(), this.spines(), this.dates));
  protected readonly chosen = signal<ShelfSpine | null>(null);
  protected readonly formats = (['print', 'ebook', 'audiobook'] as const).map((format) => ({ format, words: FORMAT_WORDS[format] }));

  /** What a spine says when pointed at or tapped: title, authors, length, format and finish day. */
  protected spineLine(spine: ShelfSpine): string {
    const length = spine.pages === null || spine.format === 'audiobook' ? '' : `, ${goalAmount(spine.pages, 'pages')}`;
    return `${titleAndAuthors(spine)}${length} · ${FORMAT_WORDS[spine.format]} · finished ${this.dates.format(spine.finishedOn, 'dayMonth')}`;
  }

  protected choose(spine: ShelfSpine): void {
    this.chosen.set(this.chosen()?.id === spine.id ? null : spine);
  }

  protected async save(): Promise<void> {
    const card = this.card()?.nativeElement;
    if (!card || this.saving()) return;
    this.saving.set(true);
    this.saveMessage.set(null);
    const fileName = `lamplight-${this.shownYear()}-shelf.png`;
    try {
      await saveAsPng(card, fileName);
      this.saveMessage.set(`Saved as ${fileName} in your downloads. It stays on this device until you share it.`);
    } catch (error) {
      this.saveMessage.set(`The image could not be made (${error instanceof Error ? error.message : 'unknown reason'}). Nothing else changed; try again.`);
    } finally {
      this.saving.set(false);
    }
  }
}
