import { booleanAttribute, ChangeDetectionStrategy, Component, computed, effect, inject, input, signal } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';

import { Covers } from '../covers';
import { placeholderColour, PLACEHOLDER_INK, titleInitials } from '../cover-placeholder';
import { liveCover } from '../live-cover';

/** How large a cover is drawn: a list thumbnail, or the book page's. */
export type BookCoverSize = 'small' | 'large';

/**
 * A book's cover from this device, fetched once from the server when another device chose it.
 * Until there is one (or when it cannot be shown) a calm placeholder stands in: the title's
 * initials on a colour of its own. Nothing here ever fails the page.
 */
@Component({
  selector: 'll-book-cover',
  imports: [MatIconModule],
  templateUrl: './book-cover.html',
  styleUrl: './book-cover.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  host: { '[class.size-small]': 'size() === "small"', '[class.size-large]': 'size() === "large"' },
})
export class BookCover {
  /** The book's `coverId`; none shows the placeholder. */
  readonly coverId = input<string | null | undefined>(null);
  /** The book's title, for the image's text alternative and the placeholder. */
  readonly title = input<string | null | undefined>('');
  readonly size = input<BookCoverSize>('small');
  /** The title is shown beside the cover: screen readers need not hear it twice. */
  readonly decorative = input(false, { transform: booleanAttribute });

  private readonly covers = inject(Covers);
  private readonly stored = liveCover(this.coverId);
  /** The stored cover for the current id; equal while the id is, so a state change keeps the URL. */
  private readonly image = computed(
    () => {
      const cover = this.stored();
      return cover && cover.id === this.coverId() ? cover : null;
    },
    { equal: (a, b) => a?.id === b?.id },
  );
  private readonly brokenUrl = signal<string | null>(null);

  protected readonly url = signal<string | null>(null);
  protected readonly showImage = computed(() => this.url() !== null && this.url() !== this.brokenUrl());
  protected readonly alt = computed(() => (this.decorative() ? '' : `Cover of ${this.title()?.trim() || 'this book'}`));
  protected readonly initials = computed(() => titleInitials(this.title()));
  protected readonly background = computed(() => placeholderColour(this.title()));
  protected readonly ink = PLACEHOLDER_INK;

  constructor() {
    // One object URL per shown image, revoked when the image changes or leaves the page.
    effect((onCleanup) => {
      const image = this.image();
      if (!image) {
        this.url.set(null);
        return;
      }
      const url = URL.createObjectURL(image.blob);
      this.url.set(url);
      onCleanup(() => URL.revokeObjectURL(url));
    });
    // Not on this device: fetch it (the service asks the server at most once for a missing one).
    effect(() => {
      const id = this.coverId();
      if (id && this.stored() === null && this.covers.online()) void this.covers.download(id);
    });
  }

  /** The browser could not draw the stored bytes: show the placeholder instead. */
  protected imageFailed(): void {
    this.brokenUrl.set(this.url());
  }
}
