import { Component } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { provideRouter, Router, withComponentInputBinding } from '@angular/router';
import { RouterTestingHarness } from '@angular/router/testing';

import type { Book } from '@shared/sync/schema/collections';

import { leaveAnswer, leaveQuestion, untilTicked } from '../../../core/pwa/testing/leave-question';
import { UnsavedWork } from '../../../core/pwa/unsaved-work';
import { unsavedWorkGuard } from '../../../core/pwa/unsaved-work-guard';
import { openTestJournal, textOf, type TestJournal } from '../../notebooks/testing/test-journal';
import { BookEditor } from './book-editor';

@Component({ selector: 'll-book-page-stub', template: '<p>The book</p>' })
class BookPageStub {}

@Component({ selector: 'll-library-stub', template: '<p>The library</p>' })
class LibraryStub {}

/** The editor on its real route guard, with a real IndexedDB journal: leaving asks only when it should. */
describe('BookEditor, leaving the page', () => {
  let journal: TestJournal;
  let harness: RouterTestingHarness;
  let router: Router;

  const page = (): HTMLElement => harness.routeNativeElement!;
  const titleInput = () => page().querySelector<HTMLInputElement>('input[formcontrolname="title"]')!;
  const typeTitle = (value: string) => {
    titleInput().value = value;
    titleInput().dispatchEvent(new Event('input'));
  };
  const named = (selector: string, text: string) => [...document.querySelectorAll<HTMLElement>(selector)].find((el) => textOf(el) === text)!;

  beforeEach(async () => {
    journal = openTestJournal([
      provideRouter(
        [
          { path: 'library', component: LibraryStub },
          { path: 'library/new', component: BookEditor, canDeactivate: [unsavedWorkGuard] },
          { path: 'library/:id', component: BookPageStub },
          { path: 'library/:id/edit', component: BookEditor, canDeactivate: [unsavedWorkGuard] },
        ],
        withComponentInputBinding(),
      ),
    ]);
    await journal.db.open();
    harness = await RouterTestingHarness.create('/library/new');
    router = TestBed.inject(Router);
    await untilTicked(() => !!titleInput(), 'the editor');
  });

  afterEach(async () => {
    document.querySelectorAll('.cdk-overlay-container').forEach((overlay) => (overlay.innerHTML = ''));
    await journal.close();
  });

  it('saves a new book and goes to its page without asking', async () => {
    typeTitle('The Salt Road');
    expect(TestBed.inject(UnsavedWork).present()).toBeTrue();

    named('button', 'Save').click();
    await untilTicked(() => /^\/library\/[0-9a-f-]{36}$/.test(router.url), 'the book page');
    expect(textOf(page())).toBe('The book');
    expect(leaveQuestion()).toBeNull();
    const saved = (await journal.store.get('books', router.url.split('/')[2])) as Book | undefined;
    expect(saved?.title).toBe('The Salt Road');
  });

  it('saves an edit and goes back to the book without asking', async () => {
    const bookId = await journal.store.create('books', { title: 'The Salt Road', format: 'print', status: 'tbr' });
    await router.navigateByUrl(`/library/${bookId}/edit`);
    await untilTicked(() => titleInput()?.value === 'The Salt Road', 'the book in the form');
    typeTitle('The Salt Road, revised');

    named('button', 'Save').click();
    await untilTicked(() => router.url === `/library/${bookId}`, 'the book page');
    expect(leaveQuestion()).toBeNull();
    expect(((await journal.store.get('books', bookId)) as Book).title).toBe('The Salt Road, revised');
  });

  it('asks before leaving with a typed title, and keeps it on "Keep editing"', async () => {
    typeTitle('Half a thought');
    const leaving = router.navigateByUrl('/library');
    await untilTicked(() => !!leaveQuestion(), 'the question');
    expect(textOf(leaveQuestion()!.querySelector('h2'))).toBe('Leave without saving?');

    leaveAnswer('Keep editing').click();
    expect(await leaving).toBeFalse();
    expect(router.url).toBe('/library/new');
    expect(titleInput().value).toBe('Half a thought');
    expect(await journal.store.list('books')).toEqual([]);
  });

  it('leaves a typed title behind on "Leave", saving nothing', async () => {
    typeTitle('Half a thought');
    const leaving = router.navigateByUrl('/library');
    await untilTicked(() => !!leaveQuestion(), 'the question');
    leaveAnswer('Leave').click();
    expect(await leaving).toBeTrue();
    expect(textOf(page())).toBe('The library');
    expect(await journal.store.list('books')).toEqual([]);
  });

  it('lets Cancel discard a typed title without asking', async () => {
    typeTitle('Half a thought');
    named('a', 'Cancel').click();
    await untilTicked(() => router.url === '/library', 'the library');
    expect(leaveQuestion()).toBeNull();
    expect(textOf(page())).toBe('The library');
  });
});
