import { provideHttpClient } from '@angular/common/http';
import { DeferBlockState, TestBed, type ComponentFixture } from '@angular/core/testing';
import { MatSnackBar } from '@angular/material/snack-bar';
import { provideRouter } from '@angular/router';
import { provideServiceWorker } from '@angular/service-worker';

import { App } from './app';
import { routes } from './app.routes';
import { forgetSession, rememberSession } from './core/auth/testing/session-fixtures';
import { PAGE_RELOAD } from './core/pwa/page-reload';
import { untilTicked } from './core/pwa/testing/leave-question';
import { IPHONE_SAFARI, runAsInstalled, snackBarText } from './core/pwa/testing/pwa-fixtures';

/** The shell as the app config sets it up, with the service worker off and no reloads. */
function configureShell(): void {
  TestBed.configureTestingModule({
    imports: [App],
    providers: [
      provideRouter(routes),
      provideHttpClient(),
      provideServiceWorker('ngsw-worker.js', { enabled: false }),
      { provide: PAGE_RELOAD, useValue: () => fail('the app tried to reload the page') },
    ],
  });
}

/** The signed-in shell is an `@defer` block: render it now, as the app does once its chunk loads. */
async function renderShell(fixture: ComponentFixture<App>): Promise<void> {
  await fixture.whenStable();
  for (const block of await fixture.getDeferBlocks()) await block.render(DeferBlockState.Complete);
  await fixture.whenStable();
}

describe('App shell', () => {
  beforeEach(configureShell);

  afterEach(() => forgetSession());

  it("draws the shell's icons with Lamplight's icon font, which the shell sets (the app config does not)", async () => {
    rememberSession();
    const fixture = TestBed.createComponent(App);
    await renderShell(fixture);
    const icons = Array.from((fixture.nativeElement as HTMLElement).querySelectorAll('mat-icon'));

    expect(icons.length).toBeGreaterThan(0);
    for (const icon of icons) {
      expect(icon.classList).toContain('material-symbols-outlined');
      expect(icon.classList).not.toContain('material-icons');
    }
  });

  it('for a signed-in reader, shows the Lamplight name, their name and a link to each main destination', async () => {
    rememberSession();
    const fixture = TestBed.createComponent(App);
    await renderShell(fixture);
    const element = fixture.nativeElement as HTMLElement;

    expect(element.querySelector('.brand-name')?.textContent).toBe('Lamplight');
    expect(element.querySelector('.reader-name')?.textContent).toBe('Ilse Varga');
    const links = Array.from(element.querySelectorAll<HTMLAnchorElement>('nav[aria-label="Main"] a'));
    expect(links.map((link) => link.getAttribute('href'))).toEqual([
      '/today',
      '/library',
      '/timer',
      '/journal',
      '/goals',
      '/goals/challenges',
      '/insights',
      '/circles',
    ]);
  });

  it('for a signed-in reader, offers an Add action with "Capture a quote" and "Add a book"', async () => {
    rememberSession();
    const fixture = TestBed.createComponent(App);
    await renderShell(fixture);
    const add = (fixture.nativeElement as HTMLElement).querySelector<HTMLButtonElement>('button[aria-label="Add"]')!;

    add.click();
    await fixture.whenStable();
    const items = Array.from(document.querySelectorAll('.mat-mdc-menu-panel [mat-menu-item]'));
    expect(items.map((item) => item.textContent?.replace(item.querySelector('mat-icon')?.textContent ?? '', '').trim())).toEqual(['Capture a quote', 'Add a book']);
    expect(items[1]?.getAttribute('href')).toBe('/library/new');
  });

  /** The account menu's items, by their text without the icon. */
  async function accountMenuItems(element: HTMLElement): Promise<HTMLElement[]> {
    element.querySelector<HTMLButtonElement>('button.account')!.click();
    await untilTicked(() => document.querySelector('.mat-mdc-menu-panel') !== null, 'the account menu');
    return Array.from(document.querySelectorAll<HTMLElement>('.mat-mdc-menu-panel [mat-menu-item]'));
  }
  const itemText = (item: HTMLElement) => item.textContent?.replace(item.querySelector('mat-icon')?.textContent ?? '', '').trim();

  it('on an iPhone, offers Install Lamplight in the account menu and shows how to add it to the Home Screen', async () => {
    spyOnProperty(navigator, 'userAgent').and.returnValue(IPHONE_SAFARI);
    rememberSession();
    const fixture = TestBed.createComponent(App);
    await renderShell(fixture);

    const install = (await accountMenuItems(fixture.nativeElement)).find((item) => itemText(item) === 'Install Lamplight')!;
    install.click();
    await untilTicked(() => document.querySelector('ll-install-help-dialog') !== null, 'the how-to');
    expect(document.querySelector('ll-install-help-dialog h2')?.textContent).toBe('Add Lamplight to your Home Screen');
  });

  it('once installed, offers no Install Lamplight', async () => {
    spyOnProperty(navigator, 'userAgent').and.returnValue(IPHONE_SAFARI);
    runAsInstalled();
    rememberSession();
    const fixture = TestBed.createComponent(App);
    await renderShell(fixture);

    expect((await accountMenuItems(fixture.nativeElement)).map(itemText)).toEqual(['Settings', 'Sign out']);
  });

  it('with nobody signed in, shows no journal navigation', async () => {
    forgetSession();
    const fixture = TestBed.createComponent(App);
    await renderShell(fixture);

    expect((fixture.nativeElement as HTMLElement).querySelector('nav[aria-label="Main"]')).toBeNull();
    expect((fixture.nativeElement as HTMLElement).querySelector('button[aria-label="Add"]')).toBeNull();
  });

  it('sends an unknown address to the not-found page rather than a blank screen', () => {
    const fallback = routes.find((route) => route.path === '**');
    expect(fallback?.loadComponent).toBeDefined();
  });
});

describe('App shell and this device’s storage', () => {
  const ASKED = 'lamplight.storageAsked';

  function browserAnswers(kept: boolean): jasmine.Spy {
    spyOn(navigator.storage, 'persisted').and.resolveTo(false);
    spyOn(navigator.storage, 'estimate').and.resolveTo({ usage: 0, quota: 0 });
    return spyOn(navigator.storage, 'persist').and.resolveTo(kept);
  }

  beforeEach(() => {
    localStorage.removeItem(ASKED);
    configureShell();
  });

  afterEach(() => {
    TestBed.inject(MatSnackBar).dismiss();
    localStorage.removeItem(ASKED);
    forgetSession();
  });

  it('after sign-in asks the browser to keep storage and says once on this device that it will', async () => {
    const persist = browserAnswers(true);
    rememberSession();
    await renderShell(TestBed.createComponent(App));

    await untilTicked(() => snackBarText() !== null, 'the storage message');
    expect(persist).toHaveBeenCalledTimes(1);
    expect(snackBarText()).toBe('Your browser will keep Lamplight’s storage, so your journal is not cleared to free space.');

    // The next visit asks again (the answer can change) but does not say it again.
    TestBed.inject(MatSnackBar).dismiss();
    TestBed.resetTestingModule();
    configureShell();
    await renderShell(TestBed.createComponent(App));
    await untilTicked(() => persist.calls.count() === 2, 'the second question');
    await new Promise((resolve) => setTimeout(resolve, 50));
    TestBed.tick();
    expect(snackBarText()).toBeNull();
  });

  it('says what a refusal means, with the two ways to keep the journal safe', async () => {
    browserAnswers(false);
    rememberSession();
    await renderShell(TestBed.createComponent(App));

    await untilTicked(() => snackBarText() !== null, 'the storage message');
    expect(snackBarText()).toBe('Your browser may clear storage when space runs low. Installing Lamplight and syncing keep your journal safe.');
    expect(localStorage.getItem(ASKED)).toBe('true');
  });

  it('offers Install Lamplight in the first-run message where the browser can install it', async () => {
    spyOnProperty(navigator, 'userAgent').and.returnValue(IPHONE_SAFARI);
    browserAnswers(false);
    rememberSession();
    await renderShell(TestBed.createComponent(App));

    await untilTicked(() => snackBarText() !== null, 'the storage message');
    const action = document.querySelector<HTMLButtonElement>('.mat-mdc-snack-bar-action, [matSnackBarAction]');
    expect(action?.textContent?.trim()).toBe('Install Lamplight');
    action!.click();
    await untilTicked(() => document.querySelector('ll-install-help-dialog') !== null, 'the how-to');
    expect(document.querySelector('ll-install-help-dialog h2')?.textContent).toBe('Add Lamplight to your Home Screen');
  });

  it('asks nothing before anyone signs in', async () => {
    const persist = browserAnswers(true);
    forgetSession();
    const fixture = TestBed.createComponent(App);
    await renderShell(fixture);
    await new Promise((resolve) => setTimeout(resolve, 50));

    expect(persist).not.toHaveBeenCalled();
    expect(localStorage.getItem(ASKED)).toBeNull();
  });
});
