import { afterNextRender, ChangeDetectionStrategy, Component, DestroyRef, inject, Injector } from '@angular/core';
import { RouterOutlet } from '@angular/router';

import { Auth } from './core/auth/auth';
import { InstallPrompt } from './core/pwa/install-prompt';
import { VersionReady } from './core/pwa/version-ready';
import { SignedInShell } from './signed-in-shell';

/**
 * The app's root: the sign-in pages alone, or, for a signed-in reader, {@link SignedInShell}
 * (deferred: the local journal, sync, dialogs and the rest load after the first screen).
 */
@Component({
  selector: 'll-root',
  imports: [RouterOutlet, SignedInShell],
  templateUrl: './app.html',
  styleUrl: './app.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class App {
  protected readonly user = inject(Auth).user;

  constructor() {
    inject(InstallPrompt); // listens from the start: the browser offers installing once, maybe before sign-in
    inject(VersionReady); // listens from the start: the worker may announce a new version before the prompts load
    const injector = inject(Injector);
    let destroyed = false;
    inject(DestroyRef).onDestroy(() => (destroyed = true));
    // Update prompts need the snackbar: loaded after the first render, signed in or not.
    afterNextRender(() => void import('./core/pwa/app-updates').then(({ AppUpdates }) => destroyed || injector.get(AppUpdates)));
  }
}
