import { ChangeDetectionStrategy, Component } from '@angular/core';

/** Every book the reader tracks: owned, borrowed, wanted and finished. */
@Component({
  selector: 'll-library',
  templateUrl: './library.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Library {}
