import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { RouterLink } from '@angular/router';

import { SyncEngine } from '../sync-engine';
import { ReaderDatePipe } from '../../../ui/reader-date';

/**
 * What the sync status's menu says in full. Its own component so that the menu's `@defer` loads
 * this module (which names the router's link by name) rather than all of `@angular/router`, as a
 * deferred `RouterLink` in the status's own template would.
 */
@Component({
  selector: 'll-sync-details',
  imports: [ReaderDatePipe, RouterLink],
  templateUrl: './sync-details.html',
  styles: `
    :host {
      display: block;
      max-width: 320px;
      padding: 4px 16px;
      font: var(--mat-sys-body-medium);
    }
    p {
      margin: 8px 0;
    }
    .refused {
      color: var(--mat-sys-error);
    }
    .pull-progress {
      width: 100%;
      accent-color: var(--mat-sys-primary);
    }
  `,
  host: { class: 'details', role: 'presentation', '(click)': '$event.stopPropagation()', '(keydown)': '$event.stopPropagation()' },
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SyncDetails {
  protected readonly engine = inject(SyncEngine);
}
