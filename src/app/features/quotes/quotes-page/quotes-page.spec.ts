import { TestBed, type ComponentFixture } from '@angular/core/testing';

import { STARTER_LABELS } from '@shared/journal/starter-labels';
import type { Quote } from '@shared/sync/schema/collections';

import { found as until, openTestJournal, type TestJournal } from '../../../core/testing/test-journal';
import { JournalStore } from '../../../core/data/journal-store';
import { QuotesPage } from './quotes-page';

/** The quotes screen against real IndexedDB, one fresh database per spec. */
describe('QuotesPage', () => {
  let store: JournalStore;
  let journal: TestJournal;
  let fixture: ComponentFixture<QuotesPage>;
  const page = () => fixture.nativeElement as HTMLElement;
  const passages = () => Array.from(page().querySelectorAll('blockquote')).map((quote) => quote.textContent?.trim());
  const count = () => page().querySelector('[role="status"]')?.textContent?.trim();
  /** A button by its accessible name: its aria-label, else its text without the icon's ligature. */
  const button = (root: Element, name: string) =>
    Array.from(root.querySelectorAll<HTMLButtonElement>('button')).find((b) => {
      const icon = b.querySelector('mat-icon')?.textContent ?? '';
      return (b.getAttribute('aria-label') ?? b.textContent!.replace(icon, '').trim()) === name;
    })!;
  const card = (passage: string) => Array.from(page().querySelectorAll('ll-quote-card')).find((c) => c.querySelector('blockquote')?.textContent?.includes(passage))!;
  const reRead = STARTER_LABELS.find((label) => label.name === 'Re-read')!;

  beforeEach(() => {
    journal = openTestJournal();
    store = journal.store;
  });

  afterEach(async () => {
    fixture?.destroy();
    await journal.close();
  });

  it('with no quotes yet, explains how to capture one', async () => {
    fixture = TestBed.createComponent(QuotesPage);
    await until(() => page().querySelector('.empty'), 'the empty state');
    expect(page().querySelector('.empty h2')?.textContent).toBe('Keep the lines that stay with you');
    expect(page().querySelector('.empty')?.textContent).toContain('Capture a quote');
    expect(button(page(), 'Capture your first quote')).toBeTruthy();
  });

  it('lists quotes from every book newest first; searches, filters by label and favourite; copies with the source line', async () => {
    const almanac = await store.create('books', { title: 'The Salt Road Almanac', authors: ['Ada Pell'], format: 'print', status: 'reading' });
    const ete = await store.create('books', { title: 'Un été à Noirmoutier', authors: ['Hélène Duclos'], format: 'ebook', status: 'finished' });
    await store.create('quotes', {
      bookId: almanac,
      text: 'Salt keeps what the sea forgets.',
      page: 42,
      labelIds: [reRead.id],
      capturedAt: '2026-03-01T08:00:00.000Z',
    });
    await store.create('quotes', { bookId: ete, text: 'La mer monte sans bruit.', ebookLocation: '37%', favourite: true, capturedAt: '2026-03-04T08:00:00.000Z' });
    const gone = await store.create('quotes', { bookId: ete, text: 'Deleted before.', capturedAt: '2026-03-05T08:00:00.000Z' });
    await store.remove('quotes', gone);

    fixture = TestBed.createComponent(QuotesPage);
    await until(() => passages().length === 2, 'two quotes');
    expect(passages()).toEqual(['La mer monte sans bruit.', 'Salt keeps what the sea forgets.']);
    expect(count()).toBe('2 quotes');
    expect(card('Salt keeps').querySelector('.source')?.textContent).toContain('The Salt Road Almanac');
    expect(card('Salt keeps').querySelector('.position')?.textContent).toBe('p. 42');
    expect(card('La mer').querySelector('.position')?.textContent).toBe('37%');

    // By the author's name typed without accents.
    const search = page().querySelector<HTMLInputElement>('input[type="search"]')!;
    search.value = 'helene';
    search.dispatchEvent(new Event('input'));
    await until(() => passages().length === 1, 'one match');
    expect(passages()).toEqual(['La mer monte sans bruit.']);
    expect(count()).toBe('1 of 2 quotes');
    search.value = '';
    search.dispatchEvent(new Event('input'));
    await until(() => passages().length === 2, 'both again');

    // Only the labels in use are offered.
    const chips = await until(() => page().querySelectorAll<HTMLElement>('[aria-label="Filter by label"] mat-chip-option'), 'label chips');
    expect(Array.from(chips).map((chip) => chip.textContent?.trim())).toEqual([`${reRead.icon}${reRead.name}`]);
    chips[0]!.querySelector<HTMLElement>('[role="option"], button')!.click();
    await until(() => passages().length === 1, 'the labelled quote');
    expect(passages()).toEqual(['Salt keeps what the sea forgets.']);
    chips[0]!.querySelector<HTMLElement>('[role="option"], button')!.click();
    await until(() => passages().length === 2, 'both again');

    // Only favourites, then one more favourite from its card.
    page().querySelector<HTMLElement>('mat-slide-toggle button')!.click();
    await until(() => passages().length === 1, 'the favourite');
    expect(passages()).toEqual(['La mer monte sans bruit.']);
    page().querySelector<HTMLElement>('mat-slide-toggle button')!.click();
    await until(() => passages().length === 2, 'both again');
    button(card('Salt keeps'), 'Favourite').click();
    await until(() => button(card('Salt keeps'), 'Favourite').getAttribute('aria-pressed') === 'true', 'the favourite saved');
    expect(((await store.get('quotes', (await store.list('quotes')).find((q) => q.page === 42)!.id)) as Quote).favourite).toBeTrue();

    const writeText = spyOn(navigator.clipboard, 'writeText').and.resolveTo();
    button(card('Salt keeps'), 'Copy').click();
    await until(() => writeText.calls.count() === 1, 'the copy');
    expect(writeText).toHaveBeenCalledWith('“Salt keeps what the sea forgets.”\n— Ada Pell, The Salt Road Almanac, p. 42');
  });

  it('deletes a quote by tombstone, and Undo brings it back', async () => {
    const bookId = await store.create('books', { title: 'Glasswing', format: 'print', status: 'reading' });
    const id = await store.create('quotes', { bookId, text: 'Light bends.', capturedAt: '2026-03-01T08:00:00.000Z' });
    fixture = TestBed.createComponent(QuotesPage);
    await until(() => passages().length === 1, 'the quote');

    button(card('Light bends'), 'Delete').click();
    await until(() => page().querySelector('.empty'), 'the quote gone');
    expect((await store.get('quotes', id))?.deleted).toBeTrue();

    const undo = await until(
      () => Array.from(document.querySelectorAll<HTMLButtonElement>('.mat-mdc-snack-bar-container button')).find((b) => b.textContent?.includes('Undo')),
      'Undo',
    );
    undo.click();
    await until(() => passages().length === 1, 'the quote back');
    expect((await store.get('quotes', id))?.deleted).toBeFalse();
  });
});
