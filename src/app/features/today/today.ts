import { ChangeDetectionStrategy, Component } from '@angular/core';

/** The home page: what the reader is in the middle of today. */
@Component({
  selector: 'll-today',
  templateUrl: './today.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Today {}
