import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';

/** How one of the five stars is drawn. */
export type StarKind = 'full' | 'half' | 'empty';

/** The five stars of a rating from 0.5 to 5 in half steps. */
export function starKinds(rating: number | null | undefined): StarKind[] {
  const value = rating ?? 0;
  return [1, 2, 3, 4, 5].map((n) => (value >= n ? 'full' : value >= n - 0.5 ? 'half' : 'empty'));
}

// One five-pointed star in a 24 × 24 box. Full, half and empty stars differ by shape (a solid
// star, a star solid on its left half only, an outline), not only by colour (WCAG 1.4.1), and
// being SVG they keep that shape at any size, whatever the icon font ships.
const STAR = 'M12 2.5l2.9 6.1 6.6.8-4.9 4.6 1.3 6.6L12 17.3l-5.9 3.3 1.3-6.6-4.9-4.6 6.6-.8z';

/** A half-star rating shown as five stars, read out as "3.5 of 5 stars". */
@Component({
  selector: 'll-star-rating',
  template: `
    @if (rating() != null) {
      <span class="stars" role="img" [attr.aria-label]="rating() + ' of 5 stars'">
        @for (kind of stars(); track $index) {
          <svg
            aria-hidden="true"
            focusable="false"
            viewBox="0 0 24 24"
            [attr.width]="size()"
            [attr.height]="size()"
            [attr.data-star]="kind"
            [class.on]="kind !== 'empty'"
          >
            @if (kind === 'half') {
              <path class="fill left-half" [attr.d]="star" />
            } @else if (kind === 'full') {
              <path class="fill" [attr.d]="star" />
            }
            <path class="outline" [attr.d]="star" />
          </svg>
        }
      </span>
    } @else {
      <span class="none">{{ emptyText() }}</span>
    }
  `,
  styles: `
    .stars {
      display: inline-flex;
      gap: 1px;
      vertical-align: middle;
      color: var(--mat-sys-on-surface-variant);
    }
    .on {
      color: var(--mat-sys-primary);
    }
    .fill {
      fill: currentColor;
    }
    .left-half {
      clip-path: inset(0 50% 0 0);
    }
    .outline {
      fill: none;
      stroke: currentColor;
      stroke-width: 1.6;
      stroke-linejoin: round;
    }
    .none {
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StarRating {
  /** From 0.5 to 5 in half steps, or null for no rating. */
  readonly rating = input<number | null | undefined>(null);
  /** What to show when there is no rating. */
  readonly emptyText = input('—');
  /** Width and height of each star in CSS pixels. */
  readonly size = input(18);

  protected readonly star = STAR;
  protected readonly stars = computed(() => starKinds(this.rating()));
}
