import { TestBed } from '@angular/core/testing';

import { InstallPrompt } from './install-prompt';
import { IPHONE_SAFARI, runAsInstalled } from './testing/pwa-fixtures';

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

describe('InstallPrompt on iPhone and iPad', () => {
  // iPadOS Safari asks for desktop sites, so it says Macintosh; only its touch points give it away.
  const IPAD_OR_MAC_SAFARI = 'Mozilla/5.0 (Macintosh; Intel Mac OS X 10_15_7) AppleWebKit/605.1.15 (KHTML, like Gecko) Version/18.5 Safari/605.1.15';

  /** Pretends to be a device; returns the touch points, which can be changed afterwards. */
  function onDevice(userAgent: string, touchPoints: number): jasmine.Spy {
    spyOnProperty(navigator, 'userAgent').and.returnValue(userAgent);
    return spyOnProperty(navigator, 'maxTouchPoints').and.returnValue(touchPoints);
  }

  it('offers the how-to on iPhone Safari, which has no install prompt', () => {
    onDevice(IPHONE_SAFARI, 5);
    expect(TestBed.inject(InstallPrompt).option()).toBe('ios-how-to');
  });

  it('offers the how-to on an iPad that calls itself a Mac, but not on a Mac', () => {
    const touchPoints = onDevice(IPAD_OR_MAC_SAFARI, 5);
    expect(TestBed.inject(InstallPrompt).option()).toBe('ios-how-to');

    TestBed.resetTestingModule();
    touchPoints.and.returnValue(0);
    expect(TestBed.inject(InstallPrompt).option()).toBe('none');
  });

  it('offers nothing once opened from the Home Screen', () => {
    onDevice(IPHONE_SAFARI, 5);
    Object.defineProperty(navigator, 'standalone', { value: true, configurable: true });
    try {
      expect(TestBed.inject(InstallPrompt).option()).toBe('installed');
    } finally {
      delete (navigator as { standalone?: boolean }).standalone;
    }
  });
});

describe('InstallPrompt when Lamplight runs installed', () => {
  beforeEach(() => {
    runAsInstalled();
  });

  it('offers nothing, even when the browser sends its install event', () => {
    const install = TestBed.inject(InstallPrompt);
    expect(install.option()).toBe('installed');

    window.dispatchEvent(installEvent('accepted'));
    expect(install.option()).toBe('installed');
  });

  it('stays hidden on iOS too, where the how-to would otherwise show', () => {
    spyOnProperty(navigator, 'userAgent').and.returnValue(IPHONE_SAFARI);
    expect(TestBed.inject(InstallPrompt).option()).toBe('installed');
  });
});
