import { NgTemplateOutlet } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';

import { parseLightFormat } from '@shared/journal/light-format';

/**
 * A page's text with its light formatting drawn (see shared/journal/light-format). Built from
 * elements and interpolated text only — never innerHTML — so anything typed stays text.
 */
@Component({
  selector: 'll-light-text',
  imports: [NgTemplateOutlet, MatIconModule],
  templateUrl: './light-text.html',
  styleUrl: './light-text.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LightText {
  /** The page's text as typed. */
  readonly text = input<string | null | undefined>('');
  /** The heading level a `#` line gets (`##` one below), to fit the page's own headings. */
  readonly headingLevel = input<2 | 3 | 4>(2);

  protected readonly blocks = computed(() => parseLightFormat(this.text() ?? ''));
}
