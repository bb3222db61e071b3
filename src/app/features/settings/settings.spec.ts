import { provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';

import { openTestJournal, until, type TestJournal } from '../../core/testing/test-journal';
import { Settings } from './settings';

/** Settings offers the install where the browser can install Lamplight (issue 19: not only in the account menu). */
describe('Settings', () => {
  let journal: TestJournal;
  afterEach(() => journal.close());

  it('offers Install Lamplight once the browser says it can install it', async () => {
    journal = openTestJournal([provideHttpClientTesting()]);
    const fixture = TestBed.createComponent(Settings);
    const page = fixture.nativeElement as HTMLElement;
    const install = () => [...page.querySelectorAll('button')].find((button) => button.textContent?.includes('Install Lamplight'));
    await fixture.whenStable();
    expect(install()).toBeUndefined();

    // A stand-in for Chromium's BeforeInstallPromptEvent, as install-prompt.spec.ts dispatches it.
    const event = new Event('beforeinstallprompt', { cancelable: true }) as Event & { prompt: () => Promise<void>; userChoice: Promise<unknown> };
    event.prompt = () => Promise.resolve();
    event.userChoice = new Promise(() => undefined);
    window.dispatchEvent(event);
    await until(() => install() !== undefined, fixture);
    expect(install()!.closest('ll-install-button')).not.toBeNull();
  });
});
