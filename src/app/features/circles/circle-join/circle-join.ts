import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { RouterLink } from '@angular/router';

import { CirclesApi } from '../data/circles-api';
import { CircleEntry } from '../data/circle-entry';

/** `/circles/join#invite=…`: the invitation link from the e-mail. The token stays in the fragment (never in a request line). */
@Component({
  selector: 'll-circle-join',
  imports: [RouterLink, MatButtonModule],
  template: `
    <h1>Join a reading circle</h1>
    @if (entry.message(); as text) {
      <p role="alert" class="error">{{ text }}</p>
      <a mat-stroked-button routerLink="/circles">Your circles</a>
    } @else if (token) {
      <p>
        You were invited to a reading circle. The circle will see your display name, what you post there and your answers to its meetings; your own journal stays
        private.
      </p>
      <button mat-flat-button type="button" (click)="accept()" [disabled]="entry.busy()">Join the circle</button>
    } @else {
      <p role="alert" class="error">This link is incomplete. Open the whole link from the invitation e-mail.</p>
    }
  `,
  styles: [':host { display: block; max-width: 40rem; margin: 0 auto; padding: 1rem; } .error { color: var(--mat-sys-error); }'],
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CircleJoin {
  private readonly api = inject(CirclesApi);
  protected readonly token = new URLSearchParams(globalThis.location?.hash.slice(1) ?? '').get('invite');
  protected readonly entry = new CircleEntry();

  protected async accept(): Promise<void> {
    const token = this.token;
    if (token) await this.entry.enter(() => this.api.acceptInvitation(token));
  }
}
