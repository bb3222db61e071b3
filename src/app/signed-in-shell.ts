import { ChangeDetectionStrategy, Component, DestroyRef, effect, inject, Injector, viewChild } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatMenu, MatMenuItem, MatMenuTrigger } from '@angular/material/menu';
import { MatToolbarModule } from '@angular/material/toolbar';
import { RouterLink, RouterLinkActive, RouterOutlet } from '@angular/router';

import { Auth } from './core/auth/auth';
import { Covers } from './core/covers/covers';
import { LocalJournal } from './core/data/local-journal';
import { browserStorage } from './core/device/browser-storage';
import { DeviceStorage } from './core/device/device-storage';
import { allowWorkerAfterFirstSync } from './core/pwa/allow-worker-after-first-sync';
import { installLamplight } from './core/pwa/install-lamplight';
import { InstallPrompt } from './core/pwa/install-prompt';
import { ApplyTheme } from './core/settings/apply-theme';
import { TabCoordination } from './core/pwa/tab-coordination';
import { SyncStatus } from './core/sync/sync-status/sync-status';
import { SignOutFlow } from './features/account';
import { TimerBar } from './features/timer';
import { deferredMenu, type MenuTriggerLike } from './ui/deferred-menu';
import { useIconFont } from './ui/icon-font';
import { LazyOverlays } from './ui/lazy-overlays';

/** A place in the app the shell links to. */
interface Destination {
  readonly path: string;
  readonly label: string;
  readonly icon: string;
  /** Active only on this very path, not on the pages under it (Goals, not its Challenges). */
  readonly exact?: boolean;
}

/**
 * The signed-in reader's shell: brand bar, sync status, main navigation, the routed page and the
 * Add action. Deferred by {@link App}, so the sign-in page loads none of it.
 */
@Component({
  selector: 'll-signed-in-shell',
  imports: [
    RouterOutlet,
    RouterLink,
    RouterLinkActive,
    MatToolbarModule,
    MatIconModule,
    MatButtonModule,
    MatMenu,
    MatMenuItem,
    MatMenuTrigger,
    SyncStatus,
    TimerBar,
  ],
  templateUrl: './signed-in-shell.html',
  styleUrl: './signed-in-shell.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SignedInShell {
  private readonly auth = inject(Auth);
  private readonly signOutFlow = inject(SignOutFlow);
  private readonly injector = inject(Injector);
  protected readonly installPrompt = inject(InstallPrompt);

  protected readonly user = this.auth.user;
  protected readonly isAdmin = this.auth.isAdmin;
  protected readonly needsSignIn = this.auth.needsSignIn;
  protected readonly destinations: readonly Destination[] = [
    { path: '/today', label: 'Today', icon: 'wb_twilight' },
    { path: '/library', label: 'Library', icon: 'local_library' },
    { path: '/timer', label: 'Timer', icon: 'timer' },
    { path: '/journal', label: 'Journal', icon: 'edit_note' },
    { path: '/goals', label: 'Goals', icon: 'flag', exact: true },
    { path: '/goals/challenges', label: 'Challenges', icon: 'emoji_events' },
    { path: '/insights', label: 'Insights', icon: 'insights' },
    { path: '/circles', label: 'Circles', icon: 'groups' },
  ];

  constructor() {
    useIconFont(); // before any icon of the shell or its pages renders
    inject(TabCoordination);
    inject(ApplyTheme); // the reader's colour theme, from their synced settings
    inject(Covers); // uploads covers an earlier visit saved offline
    allowWorkerAfterFirstSync();
    this.askToKeepStorage();
  }

  private readonly accountTrigger = viewChild<MenuTriggerLike>('accountTrigger');
  private readonly addTrigger = viewChild<MenuTriggerLike>('addTrigger');
  protected readonly openAccountMenu = deferredMenu(this.accountTrigger);
  protected readonly openAddMenu = deferredMenu(this.addTrigger);

  protected signOut(): Promise<void> {
    return this.signOutFlow.start();
  }

  /** The quotes area (its index names the book page's quote cards too) loads on first use. */
  protected captureQuote(): void {
    void import('./features/quotes').then(({ QuoteCapture }) => this.injector.get(QuoteCapture).open());
  }

  protected readonly install = installLamplight();

  /**
   * After sign-in, ask the browser to keep the journal's storage, and say once per device what
   * it answered (Settings shows it from then on).
   */
  private askToKeepStorage(): void {
    const journal = inject(LocalJournal);
    const storage = inject(DeviceStorage);
    const overlays = inject(LazyOverlays);
    let destroyed = false;
    inject(DestroyRef).onDestroy(() => (destroyed = true));
    effect(() => {
      if (!journal.db()) return;
      void storage.requestPersistence().then((kept) => {
        if (destroyed || browserStorage.read<boolean>('lamplight.storageAsked')) return;
        browserStorage.write('lamplight.storageAsked', true);
        // The first-run message also offers to install, where this browser can.
        const installable = this.installPrompt.option() === 'prompt' || this.installPrompt.option() === 'ios-how-to';
        const message = kept
          ? 'Your browser will keep Lamplight’s storage, so your journal is not cleared to free space.'
          : 'Your browser may clear storage when space runs low. Installing Lamplight and syncing keep your journal safe.';
        void overlays.snackBar(message, installable ? 'Install Lamplight' : 'OK', { duration: installable ? 15000 : 8000 }).then((ref) => {
          if (installable) ref.onAction().subscribe(() => this.install());
        });
      });
    });
  }
}
