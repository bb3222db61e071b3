import { ChangeDetectionStrategy, Component } from '@angular/core';

/** Placeholder until this part of the journal lands. */
@Component({
  selector: 'll-quotes-page',
  template: '<h1>Quotes</h1>',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class QuotesPage {}
