import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';

import { installLamplight } from './install-lamplight';
import { InstallPrompt } from './install-prompt';

/** "Install Lamplight" where the browser can install it (Settings), or a line saying it is installed. */
@Component({
  selector: 'll-install-button',
  imports: [MatButtonModule, MatIconModule],
  template: `
    @if (offered()) {
      <button mat-stroked-button type="button" (click)="install()"><mat-icon aria-hidden="true">install_mobile</mat-icon>Install Lamplight</button>
      <p class="hint">It opens in its own window, works offline and is less likely to have its storage cleared.</p>
    } @else if (prompt.option() === 'installed') {
      <p class="hint">Lamplight is installed on this device.</p>
    }
  `,
  styles: `
    .hint {
      margin: 6px 0 0;
      color: var(--mat-sys-on-surface-variant);
      font: var(--mat-sys-body-small);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class InstallButton {
  protected readonly prompt = inject(InstallPrompt);
  protected readonly offered = computed(() => this.prompt.option() === 'prompt' || this.prompt.option() === 'ios-how-to');
  protected readonly install = installLamplight();
}
