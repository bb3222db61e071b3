import { TestBed } from '@angular/core/testing';
import { MAT_ICON_DEFAULT_OPTIONS } from '@angular/material/icon';
import { provideRouter } from '@angular/router';

import { App } from './app';
import { routes } from './app.routes';

describe('App shell', () => {
  beforeEach(() => {
    TestBed.configureTestingModule({
      imports: [App],
      providers: [
        provideRouter(routes),
        { provide: MAT_ICON_DEFAULT_OPTIONS, useValue: { fontSet: 'material-symbols-outlined' } },
      ],
    });
  });

  it('shows the Lamplight name and a link to each main destination', async () => {
    const fixture = TestBed.createComponent(App);
    await fixture.whenStable();
    const element = fixture.nativeElement as HTMLElement;

    expect(element.querySelector('.brand-name')?.textContent).toBe('Lamplight');
    const links = Array.from(element.querySelectorAll<HTMLAnchorElement>('nav[aria-label="Main"] a'));
    expect(links.map((link) => link.getAttribute('href'))).toEqual(['/today', '/library']);
  });

  it('sends an unknown address to the not-found page rather than a blank screen', () => {
    const fallback = routes.find((route) => route.path === '**');
    expect(fallback?.loadComponent).toBeDefined();
  });
});
