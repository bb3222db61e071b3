import { signal } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { MatSnackBar } from '@angular/material/snack-bar';
import { SwUpdate, type UnrecoverableStateEvent, type VersionEvent } from '@angular/service-worker';
import { Subject } from 'rxjs';

import { AppUpdates } from './app-updates';
import { PAGE_RELOAD } from './page-reload';
import { UnsavedWork } from './unsaved-work';
import { VersionReady } from './version-ready';
import { untilTicked } from './testing/leave-question';
import { snackBarText } from './testing/pwa-fixtures';

/**
 * SwUpdate is where Angular's service worker meets our code, and Angular ships no test double
 * for it: this stands in for its public surface, fed the events the worker would send.
 */
class ServiceWorkerUpdates {
  isEnabled = true;
  readonly versionUpdates = new Subject<VersionEvent>();
  readonly unrecoverable = new Subject<UnrecoverableStateEvent>();
  readonly checkForUpdate = jasmine.createSpy('checkForUpdate').and.resolveTo(false);

  versionReady(): void {
    this.versionUpdates.next({ type: 'VERSION_READY', currentVersion: { hash: 'aaa' }, latestVersion: { hash: 'bbb' } });
  }
}

const snackBarButton = (text: string) =>
  [...document.querySelectorAll<HTMLButtonElement>('.mat-mdc-snack-bar-container button')].find((button) => button.textContent?.trim() === text);

describe('AppUpdates', () => {
  let worker: ServiceWorkerUpdates;
  let reload: jasmine.Spy;
  const unsavedInput = signal(false);

  beforeEach(() => {
    worker = new ServiceWorkerUpdates();
    reload = jasmine.createSpy('reload');
    unsavedInput.set(false);
    TestBed.configureTestingModule({
      providers: [
        { provide: SwUpdate, useValue: worker },
        { provide: PAGE_RELOAD, useValue: reload },
      ],
    });
    // A form on screen whose input is not saved while `unsavedInput` is true.
    TestBed.runInInjectionContext(() => TestBed.inject(UnsavedWork).track(unsavedInput));
  });

  afterEach(() => {
    TestBed.inject(MatSnackBar).dismiss();
    TestBed.tick();
  });

  /** Starts the service as the shell does, and lets the page render. */
  function start(): void {
    TestBed.inject(AppUpdates);
    TestBed.tick();
  }

  it('looks for a new version at start and again whenever the page becomes visible', () => {
    start();
    expect(worker.checkForUpdate).toHaveBeenCalledTimes(1);

    const visibility = spyOnProperty(document, 'visibilityState').and.returnValue('hidden');
    document.dispatchEvent(new Event('visibilitychange'));
    expect(worker.checkForUpdate).toHaveBeenCalledTimes(1);

    visibility.and.returnValue('visible');
    document.dispatchEvent(new Event('visibilitychange'));
    expect(worker.checkForUpdate).toHaveBeenCalledTimes(2);
  });

  it('looks again every 30 minutes, and shrugs off a check that fails offline', () => {
    jasmine.clock().install();
    try {
      worker.checkForUpdate.and.rejectWith(new Error('offline'));
      start();
      jasmine.clock().tick(30 * 60 * 1000 - 1);
      expect(worker.checkForUpdate).toHaveBeenCalledTimes(1);
      jasmine.clock().tick(1);
      expect(worker.checkForUpdate).toHaveBeenCalledTimes(2);
    } finally {
      jasmine.clock().uninstall();
    }
  });

  it('tells the reader a new version is ready and reloads only when they choose Reload', () => {
    start();
    worker.versionUpdates.next({ type: 'VERSION_DETECTED', version: { hash: 'bbb' } });
    TestBed.tick();
    expect(snackBarText()).toBeNull(); // still downloading: nothing to offer yet

    worker.versionReady();
    TestBed.tick();
    expect(snackBarText()).toBe('A new version of Lamplight is ready.');
    TestBed.tick();
    expect(reload).not.toHaveBeenCalled();

    snackBarButton('Reload')!.click();
    TestBed.tick();
    expect(reload).toHaveBeenCalledTimes(1);
  });

  it('when the reader chooses Reload with unsaved input, says it waits and reloads once the input is saved', async () => {
    start();
    unsavedInput.set(true);
    worker.versionReady();
    TestBed.tick();

    snackBarButton('Reload')!.click();
    await untilTicked(() => snackBarText() === 'Lamplight will reload once you have saved what you are writing.', 'the wait');
    expect(reload).not.toHaveBeenCalled();

    unsavedInput.set(false); // saved
    TestBed.tick();
    expect(reload).toHaveBeenCalledTimes(1);
  });

  describe('when this version cannot go on', () => {
    beforeEach(() => jasmine.clock().install());
    afterEach(() => jasmine.clock().uninstall());

    /**
     * Lets the message come in (its animation takes 200 ms at most), stay its 6 seconds and go
     * out again, then lets what follows run in real time.
     */
    async function messageTimeEnds(): Promise<void> {
      jasmine.clock().tick(200);
      jasmine.clock().tick(6000);
      jasmine.clock().tick(200);
      jasmine.clock().uninstall();
      await new Promise((resolve) => setTimeout(resolve, 20));
      TestBed.tick();
      jasmine.clock().install(); // for afterEach
    }

    it('says so, leaves the message on screen and then reloads', async () => {
      start();
      worker.unrecoverable.next({ type: 'UNRECOVERABLE_STATE', reason: 'a file of this version is gone from the server' });
      TestBed.tick();
      expect(snackBarText()).toBe('Lamplight has to reload to keep working. Your journal is safe on this device.');
      jasmine.clock().tick(5999);
      TestBed.tick();
      expect(reload).not.toHaveBeenCalled(); // a reload now would take the message away unread

      await messageTimeEnds();
      expect(reload).toHaveBeenCalledTimes(1);
    });

    it('says so too when the worker told of it before the prompts loaded (they load after the first screen)', async () => {
      TestBed.inject(VersionReady); // the root listens from the start
      worker.unrecoverable.next({ type: 'UNRECOVERABLE_STATE', reason: 'a file of this version is gone from the server' });
      start();
      expect(snackBarText()).toBe('Lamplight has to reload to keep working. Your journal is safe on this device.');
      await messageTimeEnds();
      expect(reload).toHaveBeenCalledTimes(1);
    });

    it('with unsaved input, waits for the save before reloading', async () => {
      start();
      unsavedInput.set(true);
      worker.unrecoverable.next({ type: 'UNRECOVERABLE_STATE', reason: 'broken' });
      TestBed.tick();
      await messageTimeEnds();
      expect(snackBarText()).toBeNull();
      expect(reload).not.toHaveBeenCalled();

      unsavedInput.set(false);
      TestBed.tick();
      expect(reload).toHaveBeenCalledTimes(1);
    });
  });

  it('does nothing where the service worker is off (development, unsupported browsers)', () => {
    worker.isEnabled = false;
    start();
    worker.versionReady();
    worker.unrecoverable.next({ type: 'UNRECOVERABLE_STATE', reason: 'broken' });
    TestBed.tick();

    expect(worker.checkForUpdate).not.toHaveBeenCalled();
    expect(snackBarText()).toBeNull();
    expect(reload).not.toHaveBeenCalled();
  });
});
