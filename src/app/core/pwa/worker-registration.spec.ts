import { isDevMode } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { SwRegistrationOptions } from '@angular/service-worker';
import type { Observable } from 'rxjs';

import { provideLamplightWorker, WorkerRegistration } from './worker-registration';

describe('provideLamplightWorker', () => {
  let options: SwRegistrationOptions;
  let registration: WorkerRegistration;

  beforeEach(() => {
    TestBed.configureTestingModule({ providers: [...provideLamplightWorker()] });
    options = TestBed.inject(SwRegistrationOptions);
    registration = TestBed.inject(WorkerRegistration);
  });

  /** How many times the strategy's observable has said "register now", and whether it has ended. */
  function watchStrategy(): { emitted: number; completed: boolean } {
    const seen = { emitted: 0, completed: false };
    const strategy = options.registrationStrategy as () => Observable<unknown>;
    strategy().subscribe({ next: () => seen.emitted++, complete: () => (seen.completed = true) });
    return seen;
  }

  it('registers in production builds only', () => {
    expect(options.enabled).toBe(!isDevMode());
  });

  it('waits for the signed-in shell to allow it, however long the app has been stable', async () => {
    const seen = watchStrategy();
    await new Promise((resolve) => setTimeout(resolve, 20));
    expect(seen).toEqual({ emitted: 0, completed: false });

    registration.allow();
    expect(seen).toEqual({ emitted: 1, completed: true });
  });

  it('says "register" once, even when allowed twice or watched late', () => {
    registration.allow();
    registration.allow();
    expect(watchStrategy()).toEqual({ emitted: 1, completed: true });
  });
});
