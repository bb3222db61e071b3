import { type ComponentFixture, TestBed } from '@angular/core/testing';

import { StoragePanel } from './storage-panel';
import { runAsInstalled } from '../../../core/pwa/testing/pwa-fixtures';

const MiB = 1024 * 1024;

/** The browser's StorageManager answering as told; returns `persist`, to answer or check. */
function browserAnswers(persisted: boolean, usage?: number, quota?: number): jasmine.Spy {
  spyOn(navigator.storage, 'persisted').and.resolveTo(persisted);
  spyOn(navigator.storage, 'estimate').and.resolveTo({ usage, quota });
  return spyOn(navigator.storage, 'persist').and.resolveTo(false);
}

/** Renders, then waits out the browser's promises (not tasks Angular knows about). */
async function settled(fixture: ComponentFixture<StoragePanel>): Promise<HTMLElement> {
  for (let i = 0; i < 3; i++) {
    await new Promise((resolve) => setTimeout(resolve));
    await fixture.whenStable();
  }
  return fixture.nativeElement as HTMLElement;
}

const text = (element: Element | null | undefined) => element?.textContent?.replace(/\s+/g, ' ').trim();
const kept = (panel: HTMLElement) => text(panel.querySelector('[role="status"]'));
const estimate = (panel: HTMLElement) => text([...panel.querySelectorAll('p')].find((p) => text(p)?.startsWith('In use')));
const caution = (panel: HTMLElement) => text(panel.querySelector('.caution'));
const askButton = (panel: HTMLElement) => [...panel.querySelectorAll('button')].find((button) => text(button) === 'Ask the browser to keep it');

describe('StoragePanel (Settings › This device)', () => {
  it('says the browser keeps the storage, shows the estimate and the caution, and offers no asking', async () => {
    const persist = browserAnswers(true, 1.5 * MiB, 2048 * MiB);
    const panel = await settled(TestBed.createComponent(StoragePanel));

    expect(kept(panel)).toBe('Your browser has agreed to keep Lamplight’s storage on this device.');
    expect(estimate(panel)).toBe('In use on this device: 1.5 MiB of about 2,048 MiB available to this app.');
    expect(caution(panel)).toBe(
      'Browsers may clear the data of a web app that is not installed and has not been opened for a while (Safari does so ' +
        'after about a week without a visit). Changes that have synced are safe on the server; changes still waiting exist ' +
        'only here. Installing Lamplight helps.',
    );
    expect(askButton(panel)).toBeUndefined();
    expect(persist).not.toHaveBeenCalled(); // opening Settings never asks by itself
  });

  it('says when the browser has not agreed, and asks again on request', async () => {
    const persist = browserAnswers(false, 0, 100 * MiB);
    const fixture = TestBed.createComponent(StoragePanel);
    const panel = await settled(fixture);
    expect(kept(panel)).toBe('Your browser has not agreed to keep Lamplight’s storage: it may clear it when space runs low.');
    expect(estimate(panel)).toBe('In use on this device: 0.0 MiB of about 100 MiB available to this app.');

    persist.and.resolveTo(true);
    askButton(panel)!.click();
    await settled(fixture);
    expect(persist).toHaveBeenCalledTimes(1);
    expect(kept(panel)).toBe('Your browser has agreed to keep Lamplight’s storage on this device.');
    expect(askButton(panel)).toBeUndefined();
  });

  it('where the browser says nothing about storage, says so, shows no figures and keeps the caution', async () => {
    spyOnProperty(navigator, 'storage').and.returnValue(undefined as unknown as StorageManager);
    const panel = await settled(TestBed.createComponent(StoragePanel));

    expect(kept(panel)).toBe('Your browser does not say whether it will keep Lamplight’s storage.');
    expect(estimate(panel)).toBeUndefined();
    expect(caution(panel)).toContain('Browsers may clear the data of a web app that is not installed');
    expect(askButton(panel)).toBeDefined();
  });

  it('when Lamplight runs installed, says that helps', async () => {
    browserAnswers(false, 2 * MiB, undefined);
    runAsInstalled();
    const panel = await settled(TestBed.createComponent(StoragePanel));

    expect(caution(panel)).toContain('changes still waiting exist only here. Lamplight is installed on this device, which helps.');
    expect(estimate(panel)).toBe('In use on this device: 2.0 MiB.');
  });
});
