import { Component } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { provideRouter, Router, withComponentInputBinding } from '@angular/router';
import { RouterTestingHarness } from '@angular/router/testing';

import type { Book } from '@shared/sync/schema/collections';

import { leaveAnswer, leaveQuestion, untilTicked } from '../../../core/pwa/testing/leave-question';
import { UnsavedWork } from '../../../core/pwa/unsaved-work';
import { unsavedWorkGuard } from '../../../core/pwa/unsaved-work-guard';
import { choose, field, fieldIfShown, type } from '../../../core/testing/goal-fixtures';
import { clearOverlays } from '../../../core/testing/reader-moment';
import { openTestJournal, textOf, type TestJournal } from '../../../core/testing/test-journal';
import { fieldOverlaps } from '../../../ui/testing/field-overlaps';
import { BookEditor } from './book-editor';

@Component({ selector: 'll-book-page-stub', template: '<p>The book</p>' })
class BookPageStub {}

@Component({ selector: 'll-library-stub', template: '<p>The library</p>' })
class LibraryStub {}

/** The editor on its real routes and guard, with a real IndexedDB journal. */
describe('BookEditor', () => {
  let journal: TestJournal;
  let harness: RouterTestingHarness;
  let router: Router;

  const page = (): HTMLElement => harness.routeNativeElement!;
  const titleInput = () => fieldIfShown(page(), 'Title')!;
  const typeTitle = (value: string) => {
    titleInput().value = value;
    titleInput().dispatchEvent(new Event('input'));
  };
  const named = (selector: string, text: string) => [...document.querySelectorAll<HTMLElement>(selector)].find((el) => textOf(el) === text)!;
  /** Fields found by their visible labels, as a reader finds them. */
  const fill = (label: string, value: string) => type(field(page(), label), value);
  const pick = (label: string, value: string) => choose(field<HTMLSelectElement>(page(), label), value);
  const messageUnder = (label: string) => textOf(field(page(), label).closest('mat-form-field')?.querySelector('mat-error'));
  const legends = () => [...page().querySelectorAll('legend')].map((legend) => textOf(legend));
  const labels = () => [...page().querySelectorAll('label')].map((label) => textOf(label).replace(/\s*\*$/, ''));
  const chooseDnf = async () => {
    pick('Status', 'dnf');
    await untilTicked(() => legends().includes('Did not finish'), 'the DNF part');
  };
  /** Saves a new book and returns what was stored. */
  const saveNew = async (): Promise<Book> => {
    named('button', 'Save').click();
    await untilTicked(() => /^\/library\/[0-9a-f-]{36}$/.test(router.url), 'the book page');
    return (await journal.store.get('books', router.url.split('/')[2])) as Book;
  };
  /** Saves, expecting the form to refuse: the alert shows and nothing is written. */
  const saveRefused = async () => {
    named('button', 'Save').click();
    await untilTicked(() => textOf(page().querySelector('[role="alert"]')) === 'Some fields need attention.', 'the alert');
    expect(router.url).toBe('/library/new');
    expect(await journal.store.list('books')).toEqual([]);
    expect(await journal.db.outbox.count()).toBe(0);
  };

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
    clearOverlays();
    await journal.close();
  });

  it('leaves room under every hint, on a phone and on a laptop, so no hint runs into the next field', async () => {
    for (const width of ['360px', '760px']) {
      page().style.width = width;
      await untilTicked(() => true, 'the layout');
      expect(fieldOverlaps(page(), 4)).withContext(width).toEqual([]);
    }
    expect(page().querySelectorAll('mat-hint').length).toBeGreaterThan(3);
  });

  describe('leaving the page', () => {
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

  describe('field messages', () => {
    it('asks for a title, also when only spaces were typed, and saves nothing', async () => {
      await saveRefused();
      expect(messageUnder('Title')).toBe('Title is required');

      fill('Title', '   ');
      await saveRefused();
      expect(messageUnder('Title')).toBe('Title is required');
    });

    it('refuses an ISBN whose check digit is wrong, with the reason', async () => {
      fill('Title', 'The Salt Road');
      fill('ISBN', '978-0-306-40615-8'); // ISO 2108's example ends in 7
      await saveRefused();
      expect(messageUnder('ISBN')).toBe('Enter a valid ISBN-10 or ISBN-13 (check the digits)');

      fill('ISBN', '0-306-40615-3'); // the ISBN-10 form ends in 2
      await saveRefused();
      expect(messageUnder('ISBN')).toBe('Enter a valid ISBN-10 or ISBN-13 (check the digits)');
    });

    it('takes an ISBN-10 and stores it as ISBN-13 (ISO 2108: 0-306-40615-2 is 978-0-306-40615-7)', async () => {
      fill('Title', 'The Salt Road');
      fill('ISBN', '0-306-40615-2');
      expect((await saveNew()).isbn).toBe('9780306406157');
    });

    it('refuses page counts outside 1 to 100,000 and parts of pages', async () => {
      fill('Title', 'The Salt Road');
      for (const pages of ['0', '100001', '12.5', 'many']) {
        fill('Page count', pages);
        await saveRefused();
        expect(messageUnder('Page count')).withContext(pages).toBe('Use a whole number from 1 to 100,000');
      }
      fill('Page count', '100000');
      expect((await saveNew()).pageCount).toBe(100_000);
    });

    it('refuses listening minutes outside 1 to 20,000 for an audiobook', async () => {
      fill('Title', 'The Salt Road');
      pick('Format', 'audiobook');
      await untilTicked(() => labels().includes('Length in minutes'), 'the minutes field');
      fill('Length in minutes', '20001');
      await saveRefused();
      expect(messageUnder('Length in minutes')).toBe('Use a whole number of minutes from 1 to 20,000');
    });

    it('refuses years outside 1 to 3000', async () => {
      fill('Title', 'The Salt Road');
      for (const year of ['0', '3001', '19.5']) {
        fill('Year', year);
        await saveRefused();
        expect(messageUnder('Year')).withContext(year).toBe('Use a year such as 2026');
      }
      fill('Year', '2026');
      expect((await saveNew()).year).toBe(2026);
    });

    it('offers only ratings from half a star to five, in halves, and stores the one chosen', async () => {
      const options = [...field<HTMLSelectElement>(page(), 'Rating').options].map((option) => option.value);
      expect(options).toEqual(['', '0.5', '1', '1.5', '2', '2.5', '3', '3.5', '4', '4.5', '5']);
      fill('Title', 'The Salt Road');
      pick('Rating', '4.5');
      expect((await saveNew()).rating).toBe(4.5);
    });
  });

  describe('the parts that apply', () => {
    it('shows Did not finish only for DNF, and saves how far, in what, when and why', async () => {
      expect(legends()).not.toContain('Did not finish');
      fill('Title', 'The Long Winter Ledger');
      await chooseDnf();
      expect(labels()).toEqual(jasmine.arrayContaining(['Got as far as', 'Counted in', 'Stopped on', 'Why you stopped']));

      fill('Got as far as', '120');
      pick('Counted in', 'page');
      fill('Stopped on', '2026-03-14');
      fill('Why you stopped', 'The middle dragged');
      const saved = await saveNew();
      expect(saved).toEqual(jasmine.objectContaining({ status: 'dnf', dnfProgress: 120, dnfUnit: 'page', dnfOn: '2026-03-14', dnfReason: 'The middle dragged' }));
    });

    it('saves a DNF progress in percent, typed with a decimal comma', async () => {
      fill('Title', 'Glass Harbour');
      pick('Format', 'ebook');
      await chooseDnf();
      fill('Got as far as', '42,5'); // the field takes a decimal comma too
      pick('Counted in', 'percent');
      const saved = await saveNew();
      expect(saved.dnfProgress).toBe(42.5);
      expect(saved.dnfUnit).toBe('percent');
    });

    it('refuses a DNF progress over 100,000, with the reason', async () => {
      fill('Title', 'Glass Harbour');
      await chooseDnf();
      fill('Got as far as', '100001');
      await saveRefused();
      expect(messageUnder('Got as far as')).toBe('Use a number from 0 to 100,000');
    });

    it('shows On the wishlist only for a wished-for copy, and saves priority, where and price note', async () => {
      expect(legends()).not.toContain('On the wishlist');
      fill('Title', 'Moths of the Lower Fen');
      pick('Where it is', 'wishlist');
      await untilTicked(() => legends().includes('On the wishlist'), 'the wishlist part');

      pick('How much you want it', 'high');
      fill('Where to get it', 'The shop on Mill Lane');
      fill('Price note', 'Wait for the paperback');
      const saved = await saveNew();
      expect(saved).toEqual(
        jasmine.objectContaining({ copy: 'wishlist', wishPriority: 'high', wishWhere: 'The shop on Mill Lane', wishPriceNote: 'Wait for the paperback' }),
      );
    });

    it('does not let a field it has hidden stop the save, nor save what was typed there', async () => {
      fill('Title', 'Moths of the Lower Fen');
      fill('Page count', 'many');
      await chooseDnf();
      fill('Got as far as', '100001');
      pick('Format', 'audiobook'); // hides Page count
      pick('Status', 'reading'); // hides Did not finish
      await untilTicked(() => !legends().includes('Did not finish') && labels().includes('Length in minutes'), 'the parts hidden');

      const saved = await saveNew();
      expect(saved).toEqual(jasmine.objectContaining({ format: 'audiobook', status: 'reading' }));
      expect(saved.pageCount ?? null).toBeNull();
      expect(saved.dnfProgress ?? null).toBeNull();
    });

    it('keeps what an edit has hidden as it was stored', async () => {
      const bookId = await journal.store.create('books', {
        title: 'Glass Harbour',
        format: 'print',
        pageCount: 320,
        status: 'dnf',
        dnfProgress: 80,
        dnfUnit: 'page',
      });
      await router.navigateByUrl(`/library/${bookId}/edit`);
      await untilTicked(() => titleInput()?.value === 'Glass Harbour' && legends().includes('Did not finish'), 'the book in the form');
      fill('Got as far as', '90');
      pick('Status', 'reading');
      pick('Format', 'audiobook');
      named('button', 'Save').click();
      await untilTicked(() => router.url === `/library/${bookId}`, 'the book page');
      expect(await journal.store.get('books', bookId)).toEqual(
        jasmine.objectContaining({ status: 'reading', format: 'audiobook', pageCount: 320, dnfProgress: 80 }),
      );
    });

    it('saves an upcoming release date and the pre-order', async () => {
      fill('Title', 'The Ninth Lantern');
      fill('Release date', '2027-02-09');
      field(page(), 'Pre-ordered').click();
      const saved = await saveNew();
      expect(saved.releaseDate).toBe('2027-02-09');
      expect(saved.preordered).toBeTrue();
    });
  });

  describe('finishing a book of a series', () => {
    const SERIES = '00000000-0000-4000-8000-00000000b001';
    const FIRST = '00000000-0000-4000-8000-00000000b011';
    const SECOND = '00000000-0000-4000-8000-00000000b012';
    const snackBar = () => document.querySelector('.mat-mdc-snack-bar-container');

    beforeEach(async () => {
      const inSeries = { format: 'print', seriesId: SERIES, deleted: false } as const;
      await journal.store.write('series', SERIES, { name: 'The Lantern Isles', deleted: false });
      await journal.store.write('books', FIRST, { ...inSeries, title: 'Tide of Salt', seriesPosition: 1, status: 'reading' });
      await journal.store.write('books', SECOND, { ...inSeries, title: 'Tide of Glass', seriesPosition: 2, status: 'tbr' });
    });

    it('suggests the next unread book, as the quick status change does, and keeps the history', async () => {
      await router.navigateByUrl(`/library/${FIRST}/edit`);
      await untilTicked(() => titleInput()?.value === 'Tide of Salt', 'the book in the form');
      pick('Status', 'finished');
      named('button', 'Save').click();
      await untilTicked(() => router.url === `/library/${FIRST}`, 'the book page');

      await untilTicked(() => !!snackBar(), 'the suggestion');
      expect(textOf(snackBar())).toContain('Next in The Lantern Isles: Tide of Glass');
      expect(((await journal.store.get('books', FIRST)) as Book).status).toBe('finished');
      const history = (await journal.store.list('bookStatusChanges')).filter((change) => change.bookId === FIRST);
      expect(history.map((change) => change.status)).toEqual(['finished']);

      named('.mat-mdc-snack-bar-container button', 'Open').click();
      await untilTicked(() => router.url === `/library/${SECOND}`, 'the next book');
    });
  });
});
