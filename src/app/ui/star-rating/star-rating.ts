import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';

/** A half-star rating shown as five stars, read out as "3.5 of 5 stars". */
@Component({
  selector: 'll-star-rating',
  imports: [MatIconModule],
  template: `
    @if (rating() != null) {
      <span class="stars" role="img" [attr.aria-label]="rating() + ' of 5 stars'">
        @for (star of stars(); track $index) {
          <mat-icon aria-hidden="true" [class.filled]="star !== 'star_border'">{{ star }}</mat-icon>
        }
      </span>
    } @else {
      <span class="none">{{ emptyText() }}</span>
    }
  `,
  styles: `
    .stars { display: inline-flex; color: var(--mat-sys-on-surface-variant); }
    .filled { color: var(--mat-sys-primary); }
    mat-icon { font-size: 18px; width: 18px; height: 18px; }
    .none { color: var(--mat-sys-on-surface-variant); }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StarRating {
  /** From 0.5 to 5 in half steps, or null for no rating. */
  readonly rating = input<number | null | undefined>(null);
  /** What to show when there is no rating. */
  readonly emptyText = input('—');

  protected readonly stars = computed(() => {
    const rating = this.rating() ?? 0;
    return [1, 2, 3, 4, 5].map((n) => (rating >= n ? 'star' : rating >= n - 0.5 ? 'star_half' : 'star_border'));
  });
}
