import { ChangeDetectionStrategy, Component, input } from '@angular/core';

/** The calm, centred frame of the sign-in, registration and reset pages. */
@Component({
  selector: 'll-account-page',
  templateUrl: './account-page.html',
  styleUrl: './account-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AccountPage {
  /** The page's heading. */
  readonly heading = input.required<string>();
}
