import { ChangeDetectionStrategy, Component } from '@angular/core';
import { RouterLink } from '@angular/router';

/** Shown for an address the app does not know. */
@Component({
  selector: 'll-not-found',
  imports: [RouterLink],
  template: `
    <h1>Nothing on this page</h1>
    <p>This address is not a page of Lamplight. <a routerLink="/today">Back to Today</a>.</p>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NotFound {}
