import { afterNextRender, ChangeDetectionStrategy, Component, DestroyRef, effect, inject, Injector, untracked } from '@angular/core';
import { RouterOutlet } from '@angular/router';

import { Auth } from './core/auth/auth';
import { InstallPrompt } from './core/pwa/install-prompt';
import { VersionReady } from './core/pwa/version-ready';
import { SignedInShell } from './signed-in-shell';

/** When the update prompts load if nothing calls for them earlier. */
const PROMPTS_AFTER_MS = 10_000;

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
    const versions = inject(VersionReady); // listens from the start: the worker may announce a new version before the prompts load
    const injector = inject(Injector);
    let destroyed = false;
    const destroyRef = inject(DestroyRef);
    destroyRef.onDestroy(() => (destroyed = true));
    // Update prompts need the snackbar, overlays and a dialog (~30 KB gzip), which the first screen
    // does without: they load when the worker announces a version (or a broken one), or once the
    // app has been open a while, for their periodic check. The worker itself registers once a reader
    // is signed in and the first sync is over (core/pwa/worker-registration.ts).
    const loadPrompts = () => void import('./core/pwa/app-updates').then(({ AppUpdates }) => destroyed || injector.get(AppUpdates));
    afterNextRender(() => {
      const timer = setTimeout(loadPrompts, PROMPTS_AFTER_MS);
      destroyRef.onDestroy(() => clearTimeout(timer));
    });
    effect(() => {
      if (versions.seen() || versions.unrecoverable()) untracked(loadPrompts);
    });
  }
}
