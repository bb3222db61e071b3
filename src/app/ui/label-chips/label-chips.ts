import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';

import { LabelDirectory } from '../../core/read-model/label-directory';

/** A book's or a quote's labels as small coloured chips (labels that no longer exist are skipped). */
@Component({
  selector: 'll-label-chips',
  imports: [MatIconModule],
  template: `
    @if (labels().length) {
      <ul class="chips" aria-label="Labels">
        @for (label of labels(); track label.id) {
          <li class="chip" [attr.data-colour]="label.colour">
            <mat-icon aria-hidden="true">{{ label.icon }}</mat-icon>{{ label.name }}
          </li>
        }
      </ul>
    }
  `,
  styleUrl: './label-chips.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LabelChips {
  private readonly directory = inject(LabelDirectory);
  /** Ids of the labels to show. */
  readonly labelIds = input<readonly string[] | null | undefined>([]);

  protected readonly labels = computed(() => {
    const byId = this.directory.byId();
    return (this.labelIds() ?? []).flatMap((id) => byId.get(id) ?? []);
  });
}
