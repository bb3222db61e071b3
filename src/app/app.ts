import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatMenuModule } from '@angular/material/menu';
import { MatToolbarModule } from '@angular/material/toolbar';
import { RouterLink, RouterLinkActive, RouterOutlet } from '@angular/router';

import { Auth } from './core/auth/auth';
import { SyncStatus } from './core/sync/sync-status/sync-status';
import { SignOutFlow } from './features/account/sign-out/sign-out-flow';

/** A place in the app the shell links to. */
interface Destination {
  readonly path: string;
  readonly label: string;
  readonly icon: string;
}

/** The app shell: brand bar, main navigation and the routed page. */
@Component({
  selector: 'll-root',
  imports: [RouterOutlet, RouterLink, RouterLinkActive, MatToolbarModule, MatIconModule, MatButtonModule, MatMenuModule, SyncStatus],
  templateUrl: './app.html',
  styleUrl: './app.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class App {
  private readonly auth = inject(Auth);
  private readonly signOutFlow = inject(SignOutFlow);

  protected readonly user = this.auth.user;
  protected readonly isAdmin = this.auth.isAdmin;
  protected readonly needsSignIn = this.auth.needsSignIn;
  protected readonly destinations: readonly Destination[] = [
    { path: '/today', label: 'Today', icon: 'wb_twilight' },
    { path: '/library', label: 'Library', icon: 'local_library' },
  ];

  protected signOut(): Promise<void> {
    return this.signOutFlow.start();
  }
}
