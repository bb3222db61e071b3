import { TestBed } from '@angular/core/testing';

import { InstallPrompt } from './install-prompt';

/** A stand-in for Chromium's BeforeInstallPromptEvent, dispatched on window as the browser does. */
function installEvent(outcome: 'accepted' | 'dismissed') {
  const event = new Event('beforeinstallprompt', { cancelable: true }) as Event & { prompt: jasmine.Spy; userChoice: Promise<unknown> };
  event.prompt = jasmine.createSpy('prompt').and.resolveTo(undefined);
  event.userChoice = Promise.resolve({ outcome });
  return event;
}

describe('InstallPrompt', () => {
  it('keeps the browser’s prompt for our menu, shows it on request, and hides the offer once installed', async () => {
    const install = TestBed.inject(InstallPrompt);
    const event = installEvent('accepted');

    window.dispatchEvent(event);

    expect(event.defaultPrevented).toBeTrue();
    expect(install.option()).toBe('prompt');
    expect(await install.install()).toBeTrue();
    expect(event.prompt).toHaveBeenCalledTimes(1);
    expect(install.option()).toBe('installed');
  });

  it('offers nothing more after the reader dismisses the prompt', async () => {
    const install = TestBed.inject(InstallPrompt);
    window.dispatchEvent(installEvent('dismissed'));

    expect(await install.install()).toBeFalse();
    expect(install.option()).toBe('none');
    expect(await install.install()).toBeFalse(); // the event can be used only once
  });
});
