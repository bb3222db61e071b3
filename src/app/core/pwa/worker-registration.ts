import { inject, Injectable, isDevMode, type Provider } from '@angular/core';
import { provideServiceWorker, SwRegistrationOptions } from '@angular/service-worker';
import { ReplaySubject } from 'rxjs';

/** The latest the worker registers after a reader's screens start, first sync over or not. */
export const LATEST_REGISTRATION_MS = 30_000;

/**
 * When the service worker may register. Its install downloads every file of the app (some 150)
 * at once, which takes the browser's connections to our origin: registered as soon as the
 * sign-in page was stable, it held the reader's sign-in request back by 4–8 s in
 * `bench:first-sync` (the server answered in 20 ms). So it registers once a reader is signed in
 * and the first sync round is over (`allow`, called by the signed-in shell, at the latest
 * {@link LATEST_REGISTRATION_MS} after it starts). A signed-out visitor has nothing to keep
 * offline, so the sign-in page installs nothing.
 */
@Injectable({ providedIn: 'root' })
export class WorkerRegistration {
  private readonly allowed = new ReplaySubject<void>(1);
  private given = false;
  /** Emits once, when the worker may register. */
  readonly allowed$ = this.allowed.asObservable();

  allow(): void {
    if (this.given) return;
    this.given = true;
    this.allowed.next();
    this.allowed.complete();
  }
}

/** Angular's service worker, registering when {@link WorkerRegistration} allows it (production builds only). */
export function provideLamplightWorker(): (Provider | ReturnType<typeof provideServiceWorker>)[] {
  return [
    provideServiceWorker('ngsw-worker.js'),
    // A factory, so the strategy can wait on a service (Angular's documented way to set options at run time).
    {
      provide: SwRegistrationOptions,
      useFactory: (): SwRegistrationOptions => {
        const registration = inject(WorkerRegistration);
        return { enabled: !isDevMode(), registrationStrategy: () => registration.allowed$ };
      },
    },
  ];
}
