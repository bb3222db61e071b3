import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';

import { forgetSession, rememberSession } from '../../../core/auth/testing/session-fixtures';
import { sentRequest } from '../../../core/http/testing/sent-request';
import { VerifyEmail } from './verify-email';

describe('VerifyEmail', () => {
  let backend: HttpTestingController;
  const turn = () => new Promise((resolve) => setTimeout(resolve, 5));

  const sent = (url: string) => sentRequest(backend, url);

  function open(hash: string): HTMLElement {
    history.replaceState(null, '', `${location.pathname}${hash}`);
    TestBed.configureTestingModule({ providers: [provideHttpClient(), provideHttpClientTesting(), provideRouter([])] });
    backend = TestBed.inject(HttpTestingController);
    const fixture = TestBed.createComponent(VerifyEmail);
    fixture.autoDetectChanges();
    return fixture.nativeElement as HTMLElement;
  }

  afterEach(() => {
    backend.verify();
    history.replaceState(null, '', location.pathname);
    forgetSession();
  });

  it('posts the token from the link’s fragment once and says the address is confirmed', async () => {
    const page = open('#token=aaa.bbb.ccc');

    const request = await sent('/api/auth/verify-email');
    expect(request.request.body).toEqual({ token: 'aaa.bbb.ccc' });
    request.flush({ verified: true });
    await turn();

    expect(page.querySelector('[role="status"]')?.textContent).toContain('your address is confirmed');
  });

  it('shows the server’s reason for a bad link and, when signed in, offers a new one', async () => {
    rememberSession();
    const page = open('#token=aaa.bbb.ccc');

    (await sent('/api/auth/verify-email')).flush(
      { error: { code: 'verify_link_invalid', message: 'This link is not valid or has expired; ask for a new one from your account page', details: null } },
      { status: 400, statusText: 'Bad Request' },
    );
    await turn();

    expect(page.querySelector('[role="alert"]')?.textContent).toContain('not valid or has expired');
    (page.querySelector('button') as HTMLButtonElement).click();
    (await sent('/api/auth/verify-email/send')).flush({ verified: false }, { status: 202, statusText: 'Accepted' });
    await turn();
    expect(page.querySelector('[role="status"]')?.textContent).toContain('A new link is on its way');
  });

  it('says so when the link has no token, without asking the server', async () => {
    const page = open('');
    await turn();

    expect(page.querySelector('[role="alert"]')?.textContent).toContain('This link is incomplete');
  });
});
