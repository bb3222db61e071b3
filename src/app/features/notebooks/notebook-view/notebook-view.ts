import { ChangeDetectionStrategy, Component } from '@angular/core';

/** Placeholder until this part of the journal lands. */
@Component({
  selector: 'll-notebook-view',
  template: '<h1>Notebook</h1>',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NotebookView {}
