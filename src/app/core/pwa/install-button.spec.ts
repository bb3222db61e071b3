import { TestBed } from '@angular/core/testing';

import { InstallButton } from './install-button';
import { InstallPrompt } from './install-prompt';

describe('InstallButton (Settings › This device)', () => {
  it('offers Install Lamplight once the browser can install it, and shows the browser’s prompt when pressed', async () => {
    TestBed.inject(InstallPrompt);
    const fixture = TestBed.createComponent(InstallButton);
    const element = fixture.nativeElement as HTMLElement;
    await fixture.whenStable();
    expect(element.querySelector('button')).toBeNull();

    // A stand-in for Chromium's BeforeInstallPromptEvent, as install-prompt.spec.ts dispatches it.
    const event = new Event('beforeinstallprompt', { cancelable: true }) as Event & { prompt: jasmine.Spy; userChoice: Promise<unknown> };
    event.prompt = jasmine.createSpy('prompt').and.resolveTo(undefined);
    event.userChoice = Promise.resolve({ outcome: 'accepted' });
    window.dispatchEvent(event);
    await fixture.whenStable();

    const button = element.querySelector('button')!;
    expect(button.textContent?.trim()).toContain('Install Lamplight');
    button.click();
    await fixture.whenStable();
    expect(event.prompt).toHaveBeenCalledTimes(1);
    await fixture.whenStable();
    expect(element.textContent).toContain('Lamplight is installed on this device.');
  });
});
