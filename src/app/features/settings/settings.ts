import { LoanSettingsSection } from '../loans';
import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';

import { Auth } from '../../core/auth/auth';
import { InstallButton } from '../../core/pwa/install-button';
import { SignOutFlow } from '../account';
import { ChangePassword } from './change-password/change-password';
import { DeleteAccount } from './delete-account/delete-account';
import { Devices } from './devices/devices';
import { LookAndDates } from './look-and-dates/look-and-dates';
import { StoragePanel } from './storage-panel/storage-panel';

/** The reader's account, devices and this device's storage. */
@Component({
  selector: 'll-settings',
  imports: [RouterLink, MatButtonModule, MatIconModule, ChangePassword, Devices, DeleteAccount, InstallButton, LookAndDates, StoragePanel, LoanSettingsSection],
  templateUrl: './settings.html',
  styleUrl: './settings.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Settings {
  protected readonly user = inject(Auth).user;
  private readonly signOutFlow = inject(SignOutFlow);

  protected signOut(): Promise<void> {
    return this.signOutFlow.start();
  }
}
