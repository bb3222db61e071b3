import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';

import { liveQuerySignal } from '../../data/live-query';
import { overwrittenEdits } from '../overwritten-edits';

/** A value as the reader would read it in one line. */
function shown(value: unknown): string {
  if (value === null || value === undefined || value === '') return '(empty)';
  if (Array.isArray(value)) return value.join(', ') || '(empty)';
  const text = String(value);
  return text.length > 80 ? `${text.slice(0, 79)}…` : text;
}

/** 'pageCount' → 'page count'. */
const fieldLabel = (field: string) => field.replace(/[A-Z]/g, (letter) => ` ${letter.toLowerCase()}`);

/**
 * For a week after it happens: which of this device's edits to a row lost to a later edit made
 * on another device, with what was written here and what the row says now.
 */
@Component({
  selector: 'll-overwritten-note',
  template: `
    @if (edits().length) {
      <section class="overwritten" aria-label="Edits changed on another device">
        <p>Some of your edits here were replaced by later edits from another device:</p>
        <ul>
          @for (edit of edits(); track $index) {
            <li>
              <strong>{{ edit.field }}</strong>: you wrote “{{ edit.mine }}”; it now reads “{{ edit.now }}” (device {{ edit.device }}).
            </li>
          }
        </ul>
      </section>
    }
  `,
  styles: `
    .overwritten {
      border-inline-start: 4px solid var(--mat-sys-tertiary, currentColor);
      padding-inline-start: 12px;
      margin-block: 12px;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class OverwrittenNote {
  readonly collection = input.required<string>();
  /** The row as it is now on this device. */
  readonly row = input.required<{ readonly id: string } & Readonly<Record<string, unknown>>>();

  private readonly all = liveQuerySignal((db) => overwrittenEdits(db), []);
  protected readonly edits = computed(() =>
    this.all()
      .filter((edit) => edit.collection === this.collection() && edit.rowId === this.row().id)
      .map((edit) => ({ field: fieldLabel(edit.field), mine: shown(edit.mine), now: shown(this.row()[edit.field]), device: edit.byDevice.slice(0, 8) })),
  );
}
