import { TestBed } from '@angular/core/testing';

import { DeviceStorage } from './device-storage';

/** The browser's StorageManager (WHATWG Storage Standard), answering as told. */
function browserAnswers(answers: { persisted: boolean; persist?: boolean | Error; usage?: number; quota?: number }) {
  const storage = navigator.storage;
  return {
    persisted: spyOn(storage, 'persisted').and.resolveTo(answers.persisted),
    persist:
      answers.persist instanceof Error
        ? spyOn(storage, 'persist').and.rejectWith(answers.persist)
        : spyOn(storage, 'persist').and.resolveTo(answers.persist ?? false),
    estimate: spyOn(storage, 'estimate').and.resolveTo({ usage: answers.usage, quota: answers.quota }),
  };
}

describe('DeviceStorage', () => {
  it('asks the browser to keep storage and reports its answer with the estimate', async () => {
    const browser = browserAnswers({ persisted: false, persist: true, usage: 1_572_864, quota: 2_147_483_648 });
    const storage = TestBed.inject(DeviceStorage);
    expect(storage.report()).toEqual({ persisted: null, usageBytes: null, quotaBytes: null });

    expect(await storage.requestPersistence()).toBeTrue();
    expect(browser.persist).toHaveBeenCalledTimes(1);
    expect(storage.report()).toEqual({ persisted: true, usageBytes: 1_572_864, quotaBytes: 2_147_483_648 });
  });

  it('does not ask again when the browser already keeps it', async () => {
    const browser = browserAnswers({ persisted: true, usage: 10, quota: 100 });
    const storage = TestBed.inject(DeviceStorage);

    expect(await storage.requestPersistence()).toBeTrue();
    expect(browser.persist).not.toHaveBeenCalled();
    expect(storage.report().persisted).toBeTrue();
  });

  it('reports a refusal, and a browser that will not even be asked (private modes), as not kept', async () => {
    browserAnswers({ persisted: false, persist: false, usage: 10, quota: 100 });
    const storage = TestBed.inject(DeviceStorage);
    expect(await storage.requestPersistence()).toBeFalse();
    expect(storage.report().persisted).toBeFalse();

    (navigator.storage.persist as jasmine.Spy).and.rejectWith(new DOMException('not here', 'InvalidStateError'));
    expect(await storage.requestPersistence()).toBeFalse();
    expect(storage.report()).toEqual({ persisted: false, usageBytes: 10, quotaBytes: 100 });
  });

  it('refresh reads whether it is kept without asking', async () => {
    const browser = browserAnswers({ persisted: true, usage: 5, quota: 50 });
    const storage = TestBed.inject(DeviceStorage);

    await storage.refresh();
    expect(browser.persist).not.toHaveBeenCalled();
    expect(storage.report()).toEqual({ persisted: true, usageBytes: 5, quotaBytes: 50 });
  });

  it('keeps the answer but no figures when the estimate fails', async () => {
    browserAnswers({ persisted: false, persist: true });
    (navigator.storage.estimate as jasmine.Spy).and.rejectWith(new TypeError('no estimate'));
    const storage = TestBed.inject(DeviceStorage);

    expect(await storage.requestPersistence()).toBeTrue();
    expect(storage.report()).toEqual({ persisted: true, usageBytes: null, quotaBytes: null });
  });

  it('says nothing it does not know where the browser has no StorageManager', async () => {
    spyOnProperty(navigator, 'storage').and.returnValue(undefined as unknown as StorageManager);
    const storage = TestBed.inject(DeviceStorage);

    expect(await storage.requestPersistence()).toBeFalse();
    await storage.refresh();
    expect(storage.report()).toEqual({ persisted: null, usageBytes: null, quotaBytes: null });
  });
});
