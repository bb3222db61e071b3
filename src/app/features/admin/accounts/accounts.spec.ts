import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';

import { Accounts } from './accounts';

describe('Accounts (Admin)', () => {
  it('asks the server for one page of matches as the admin searches, and shows how many match', async () => {
    TestBed.configureTestingModule({ providers: [provideHttpClient(), provideHttpClientTesting(), provideRouter([])] });
    const http = TestBed.inject(HttpTestingController);
    const fixture = TestBed.createComponent(Accounts);
    const element = fixture.nativeElement as HTMLElement;
    const settle = async () => {
      await new Promise((resolve) => setTimeout(resolve, 20));
      fixture.detectChanges();
    };
    fixture.detectChanges();

    const first = http.expectOne((request) => request.url === '/api/admin/users');
    expect(first.request.params.get('page')).toBe('0');
    expect(first.request.params.get('size')).toBe('50');
    first.flush({ accounts: [], total: 10_000, page: 0, size: 50 });
    await settle();
    expect(element.querySelector('#accounts-count')?.textContent?.trim()).toBe('10000 accounts');

    const search = element.querySelector<HTMLInputElement>('input[type="search"]')!;
    expect(search.getAttribute('aria-describedby')).toBe('accounts-count');
    search.value = 'ada';
    search.dispatchEvent(new Event('input'));
    await new Promise((resolve) => setTimeout(resolve, 350));
    const found = http.expectOne((request) => request.url === '/api/admin/users' && request.params.get('q') === 'ada');
    found.flush({ accounts: [], total: 1, page: 0, size: 50 });
    await settle();
    expect(element.querySelector('#accounts-count')?.textContent?.trim()).toBe('1 account matching “ada”');
    expect(element.querySelector('mat-paginator')?.getAttribute('aria-label')).toBe('Pages of accounts');
    http.verify();
  });
});
