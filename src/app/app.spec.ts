import { provideHttpClient } from '@angular/common/http';
import { TestBed } from '@angular/core/testing';
import { MAT_ICON_DEFAULT_OPTIONS } from '@angular/material/icon';
import { provideRouter } from '@angular/router';
import { provideServiceWorker } from '@angular/service-worker';

import { App } from './app';
import { routes } from './app.routes';
import { forgetSession, rememberSession } from './core/auth/testing/session-fixtures';
import { PAGE_RELOAD } from './core/pwa/page-reload';

describe('App shell', () => {
  beforeEach(() => {
    TestBed.configureTestingModule({
      imports: [App],
      providers: [
        provideRouter(routes),
        provideHttpClient(),
        provideServiceWorker('ngsw-worker.js', { enabled: false }),
        { provide: PAGE_RELOAD, useValue: () => fail('the app tried to reload the page') },
        { provide: MAT_ICON_DEFAULT_OPTIONS, useValue: { fontSet: 'material-symbols-outlined' } },
      ],
    });
  });

  afterEach(() => forgetSession());

  it('for a signed-in reader, shows the Lamplight name, their name and a link to each main destination', async () => {
    rememberSession();
    const fixture = TestBed.createComponent(App);
    await fixture.whenStable();
    const element = fixture.nativeElement as HTMLElement;

    expect(element.querySelector('.brand-name')?.textContent).toBe('Lamplight');
    expect(element.querySelector('.reader-name')?.textContent).toBe('Ilse Varga');
    const links = Array.from(element.querySelectorAll<HTMLAnchorElement>('nav[aria-label="Main"] a'));
    expect(links.map((link) => link.getAttribute('href'))).toEqual(['/today', '/library', '/journal', '/goals', '/insights']);
  });

  it('for a signed-in reader, offers an Add action with "Capture a quote" and "Add a book"', async () => {
    rememberSession();
    const fixture = TestBed.createComponent(App);
    await fixture.whenStable();
    const add = (fixture.nativeElement as HTMLElement).querySelector<HTMLButtonElement>('button[aria-label="Add"]')!;

    add.click();
    await fixture.whenStable();
    const items = Array.from(document.querySelectorAll('.mat-mdc-menu-panel [mat-menu-item]'));
    expect(items.map((item) => item.textContent?.replace(item.querySelector('mat-icon')?.textContent ?? '', '').trim())).toEqual([
      'Capture a quote',
      'Add a book',
    ]);
    expect(items[1]?.getAttribute('href')).toBe('/library/new');
  });

  it('with nobody signed in, shows no journal navigation', async () => {
    forgetSession();
    const fixture = TestBed.createComponent(App);
    await fixture.whenStable();

    expect((fixture.nativeElement as HTMLElement).querySelector('nav[aria-label="Main"]')).toBeNull();
    expect((fixture.nativeElement as HTMLElement).querySelector('button[aria-label="Add"]')).toBeNull();
  });

  it('sends an unknown address to the not-found page rather than a blank screen', () => {
    const fallback = routes.find((route) => route.path === '**');
    expect(fallback?.loadComponent).toBeDefined();
  });
});
