import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { type ComponentFixture, TestBed } from '@angular/core/testing';
import { MAT_ICON_DEFAULT_OPTIONS } from '@angular/material/icon';
import { provideRouter } from '@angular/router';
import Dexie from 'dexie';

import { authInterceptor } from '../../auth/auth-interceptor';
import { forgetSession, READER, rememberSession } from '../../auth/testing/session-fixtures';
import { journalDbName, type JournalDb } from '../../data/journal-db';
import { JournalStore } from '../../data/journal-store';
import { LocalJournal } from '../../data/local-journal';
import { emptyPage, NO_NETWORK, otherTabSyncing, refusedBody, sent, SERVER_ERROR, until } from '../testing/sync-backend';
import { SyncStatus } from './sync-status';

/**
 * The shell's sync line, driven by the real engine over the real IndexedDB journal, with
 * HttpTestingController as the server. Each state is checked as text and as the button's
 * accessible name (its aria-label, which replaces the content as the name).
 */
describe('SyncStatus', () => {
  let userId: string;
  let backend: HttpTestingController;
  let fixture: ComponentFixture<SyncStatus> | undefined;
  let releaseLock: (() => Promise<void>) | undefined;

  async function configure(): Promise<void> {
    TestBed.configureTestingModule({
      imports: [SyncStatus],
      providers: [
        provideRouter([]),
        provideHttpClient(withInterceptors([authInterceptor])),
        provideHttpClientTesting(),
        { provide: MAT_ICON_DEFAULT_OPTIONS, useValue: { fontSet: 'material-symbols-outlined' } },
      ],
    });
    backend = TestBed.inject(HttpTestingController);
    await db().open(); // before any spec ends, so teardown never closes it mid-open
  }

  beforeEach(() => {
    userId = `status-${crypto.randomUUID()}`;
    rememberSession({ user: { ...READER, id: userId } });
  });

  afterEach(async () => {
    fixture?.destroy();
    fixture = undefined;
    TestBed.resetTestingModule(); // stops the engine's timers (a retry would send again)
    await releaseLock?.();
    releaseLock = undefined;
    backend.verify();
    await Dexie.delete(journalDbName(userId));
    forgetSession();
  });

  const db = (): JournalDb => TestBed.inject(LocalJournal).db()!;
  const button = () => (fixture!.nativeElement as HTMLElement).querySelector<HTMLButtonElement>('button.status')!;
  const label = () => button().querySelector('[role="status"]')?.textContent?.trim();

  /** Renders the status, which starts the engine. */
  async function render(): Promise<void> {
    fixture = TestBed.createComponent(SyncStatus);
    await fixture.whenStable();
  }

  /** Waits until the status line's text passes `check`. */
  function settles(check: (text: string) => boolean, what: string | (() => string)): Promise<void> {
    return until(async () => {
      await fixture!.whenStable();
      return check(label() ?? '');
    }, what);
  }

  /** Waits until the status reads `text`, then checks it as text and as the accessible name. */
  async function shows(text: string): Promise<void> {
    await settles(
      (current) => current === text,
      () => `the status reads "${text}" (it reads "${label()}")`,
    );
    expect(label()).toBe(text);
    expect(button().getAttribute('aria-label')).toBe(`Sync status: ${text}`);
    expect(button().hasAttribute('aria-labelledby')).toBeFalse();
  }

  /** Opens the details menu and returns its text. */
  async function details(): Promise<string> {
    button().click();
    await fixture!.whenStable();
    return document.querySelector('.sync-details .details')?.textContent?.replace(/\s+/g, ' ').trim() ?? '';
  }

  /** Another tab is syncing, so this one stays idle and shows only what it has here. */
  async function anotherTabSyncs(): Promise<void> {
    releaseLock = (await otherTabSyncing(userId)).release;
  }

  it('before anything has synced, says the words are saved on this device', async () => {
    await configure();
    await anotherTabSyncs();
    await render();

    await shows('Saved on this device');
    expect(await details()).toContain('Nothing is waiting to sync.');
  });

  const waiting = [
    { what: 'one', fields: { title: 'The Tin Heron' }, label: '1 change waiting', menu: '1 change is waiting to reach your other devices.' },
    // title, status and the deleted tombstone
    {
      what: 'several',
      fields: { title: 'Under the Marram Grass', status: 'tbr', deleted: false },
      label: '3 changes waiting',
      menu: '3 changes are waiting to reach your other devices.',
    },
  ] as const;
  for (const { what, fields, label: text, menu } of waiting) {
    it(`with changes not yet confirmed, says how many are waiting (${what})`, async () => {
      await configure();
      await TestBed.inject(JournalStore).write('books', crypto.randomUUID(), fields);
      await anotherTabSyncs();
      await render();

      await shows(text);
      expect(await details()).toContain(menu);
    });
  }

  it('while a sync runs, says syncing and turns its icon', async () => {
    await configure();
    await render();
    const pull = await sent(backend, '/api/sync/pull');

    await shows('Syncing…');
    expect(button().querySelector('mat-icon')?.classList).toContain('spinning');
    pull.flush(emptyPage('cursor-1'));
    await settles((text) => text !== 'Syncing…', 'the sync is done');
    expect(button().querySelector('mat-icon')?.classList).not.toContain('spinning');
  });

  it('after a sync, says when it last synced (local hours and minutes), with the full time in the menu', async () => {
    await configure();
    await render();
    (await sent(backend, '/api/sync/pull')).flush(emptyPage('cursor-1'));
    await until(async () => (await db().meta.get('lastSyncedAt')) !== undefined, 'the sync is recorded');
    const last = new Date((await db().meta.get('lastSyncedAt'))!.value);
    const hhmm = [last.getHours(), last.getMinutes()].map((n) => String(n).padStart(2, '0')).join(':');

    await shows(`Synced ${hhmm}`);
    const day = last.toLocaleDateString('en-US', { month: 'short', day: 'numeric', year: 'numeric' });
    expect(await details()).toContain(`Last synced ${day},`);
  });

  it('when a sync from another tab was the last one, shows its time too, with the day when it was not today', async () => {
    await configure();
    await db().meta.put({ key: 'lastSyncedAt', value: new Date(2026, 2, 14, 9, 5).toISOString() });
    await anotherTabSyncs();
    await render();

    // 14 March 2026 is long before this spec's clock (the real one): the day is shown.
    await shows('Synced 14 Mar, 09:05');
    expect(await details()).toContain('Last synced Mar 14, 2026');
  });

  it('offline with nothing waiting, says so calmly: saved here', async () => {
    await configure();
    await render();
    (await sent(backend, '/api/sync/pull')).error(new ProgressEvent('error'), NO_NETWORK);

    await shows('Offline · saved here');
    expect(await details()).toContain('You are offline. Reading and writing go on; sync resumes when you are back.');
  });

  it('offline with changes waiting, says how many', async () => {
    await configure();
    await TestBed.inject(JournalStore).create('books', { title: 'Weatherglass' });
    await render();
    (await sent(backend, '/api/sync/push')).error(new ProgressEvent('error'), NO_NETWORK);

    await shows('Offline · 2 changes waiting');
    expect(await details()).toContain('2 changes are waiting');
  });

  it('when the reader must sign in again, says so, links to sign-in and cannot sync now', async () => {
    rememberSession({ user: { ...READER, id: userId }, needsSignIn: 'This device was signed out; sign in again' });
    await configure();
    await render();

    await shows('Sign in to sync');
    const text = await details();
    expect(text).toContain('Sign in again to sync; your changes wait here.');
    const link = document.querySelector<HTMLAnchorElement>('.sync-details a');
    expect(link?.textContent).toBe('Sign in again');
    expect(link?.getAttribute('href')).toBe('/sign-in');
    const syncNow = document.querySelector<HTMLButtonElement>('.sync-details button[mat-menu-item]');
    expect(syncNow?.textContent).toContain('Sync now');
    expect(syncNow?.disabled).toBeTrue();
  });

  it('after the server refuses a change for good, counts it and gives its reason in the menu', async () => {
    await configure();
    await TestBed.inject(JournalStore).write('books', crypto.randomUUID(), { title: 'The Long Way to Ardmore' });
    await render();
    (await sent(backend, '/api/sync/push')).flush(refusedBody([{ index: 0, code: 'invalid_value', reason: 'books.title must be at most 500 characters' }]), {
      status: 400,
      statusText: 'Bad Request',
    });
    (await sent(backend, '/api/sync/pull')).flush(emptyPage('cursor-1'));

    await shows('1 change refused');
    await details();
    expect(document.querySelector('.sync-details .refused')?.textContent?.trim()).toBe('Refused: books.title must be at most 500 characters');
  });

  it('when the server fails, says it will retry and why in the menu', async () => {
    await configure();
    await render();
    (await sent(backend, '/api/sync/pull')).flush({ error: { code: 'internal', message: 'Something broke', details: null } }, SERVER_ERROR);

    await shows('Will retry');
    expect(await details()).toContain('The server answered 500; trying again shortly');
  });

  it('"Sync now" in the menu starts a sync at once', async () => {
    await configure();
    await render();
    (await sent(backend, '/api/sync/pull')).flush(emptyPage('cursor-1'));
    await settles((text) => text.startsWith('Synced '), 'the start sync is done');

    await details();
    document.querySelector<HTMLButtonElement>('.sync-details button[mat-menu-item]')!.click();
    const pull = await sent(backend, '/api/sync/pull');
    expect(pull.request.params.get('since')).toBe('cursor-1');
    await shows('Syncing…');
    pull.flush(emptyPage('cursor-2'));
    await until(async () => (await db().meta.get('cursor'))?.value === 'cursor-2', 'the sync is recorded');
  });
});
