import { ChangeDetectionStrategy, Component } from '@angular/core';

/** Placeholder until this part of the journal lands. */
@Component({
  selector: 'll-notebooks-page',
  template: '<h1>Notebooks</h1>',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NotebooksPage {}
