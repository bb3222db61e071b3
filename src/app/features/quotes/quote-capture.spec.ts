import { ApplicationRef } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { MatDialog } from '@angular/material/dialog';

import { STARTER_LABELS } from '@shared/journal/starter-labels';
import type { Quote } from '@shared/sync/schema/collections';
import { loadTextDoc, textDocName, textOf } from '@shared/text/text-doc';
import { decodeTextBytes } from '@shared/text/text-value';

import { found as until, openTestJournal, type TestJournal } from '../../core/testing/test-journal';
import { JournalStore } from '../../core/data/journal-store';
import { LocalJournal } from '../../core/data/local-journal';
import { UnsavedWork } from '../../core/pwa/unsaved-work';
import { QuoteCapture } from './quote-capture';

const dialog = () => document.querySelector<HTMLElement>('ll-quote-capture-dialog');
/** The input, text area or select of the dialog's field with this label, if it is there. */
const find = <T extends HTMLElement>(label: string): T | null => {
  const field = Array.from(dialog()?.querySelectorAll('mat-form-field') ?? []).find((f) => f.querySelector('mat-label')?.textContent?.trim() === label);
  return (field?.querySelector('input, textarea, select') as T | null) ?? null;
};
const control = <T extends HTMLElement>(label: string): T => {
  const element = find<T>(label);
  if (!element) throw new Error(`no field labelled ${label}`);
  return element;
};
function type(label: string, text: string): void {
  const input = control<HTMLInputElement>(label);
  input.value = text;
  input.dispatchEvent(new Event('input'));
}
const errors = () => Array.from(dialog()?.querySelectorAll('mat-error') ?? []).map((e) => e.textContent?.trim());

/** Real IndexedDB in Chromium, one fresh database per spec. */
describe('QuoteCapture and its dialog', () => {
  let capture: QuoteCapture;
  let store: JournalStore;
  let journal: TestJournal;

  beforeEach(() => {
    journal = openTestJournal();
    capture = TestBed.inject(QuoteCapture);
    store = journal.store;
  });

  afterEach(async () => {
    TestBed.inject(MatDialog).closeAll();
    await new Promise((resolve) => setTimeout(resolve, 0));
    await journal.close();
  });

  const quotes = async () => (await store.list('quotes')) as Quote[];

  it('from a book page: focuses the passage, and Enter in the page field saves one quote with its page, label and time', async () => {
    const bookId = await store.create('books', { title: 'The Salt Road Almanac', authors: ['Ada Pell'], format: 'print', status: 'tbr' });
    const before = Date.now();
    const saved = capture.open({ bookId });

    await until(() => document.activeElement?.tagName === 'TEXTAREA' && dialog()?.contains(document.activeElement), 'the passage to have focus');
    expect(dialog()!.querySelector('h2')?.textContent).toBe('Capture a quote');
    await until(() => find<HTMLSelectElement>('Book')?.value === bookId, 'the book to be chosen');
    type('The passage', 'Salt keeps what the sea forgets.');
    type('Page', '42');
    const reRead = STARTER_LABELS.find((label) => label.name === 'Re-read')!;
    Array.from(dialog()!.querySelectorAll<HTMLElement>('mat-chip-option'))
      .find((chip) => chip.textContent?.includes('Re-read'))!
      .querySelector<HTMLElement>('button, [role="option"]')!
      .click();
    await TestBed.inject(ApplicationRef).whenStable();
    control('Page').dispatchEvent(new KeyboardEvent('keydown', { key: 'Enter', bubbles: true }));

    const id = await saved;
    const [quote, ...others] = await quotes();
    expect(others).toEqual([]);
    expect(quote).toEqual(
      jasmine.objectContaining({ id, bookId, text: 'Salt keeps what the sea forgets.', page: 42, labelIds: [reRead.id], favourite: false, deleted: false }),
    );
    expect(Date.parse(quote!.capturedAt!)).toBeGreaterThanOrEqual(before - 1000);
    expect(Date.parse(quote!.capturedAt!)).toBeLessThanOrEqual(Date.now());
    await until(() => !dialog(), 'the dialog to close');
  });

  it('from the Add action: picks the book read most recently, asks for its unit, and Ctrl+Enter saves', async () => {
    await store.create('books', { title: 'Started long ago', format: 'print', status: 'reading', statusChangedAt: '2026-01-02T08:00:00.000Z' });
    const fen = await store.create('books', { title: 'The Fen Hours', format: 'audiobook', status: 'reading', statusChangedAt: '2026-03-02T08:00:00.000Z' });
    await store.create('books', { title: 'Done with', format: 'print', status: 'finished', statusChangedAt: '2026-04-02T08:00:00.000Z' });
    const saved = capture.open();

    await until(() => find<HTMLSelectElement>('Book')?.value === fen, 'the reading book to be chosen');
    expect(control('Audio position')).toBeTruthy();
    type('The passage', 'Reeds keep the time.');
    type('Audio position', '1:02:30');
    type('Chapter', 'Low Water');
    type('Tags', 'fen, time ,fen');
    control('The passage').dispatchEvent(new KeyboardEvent('keydown', { key: 'Enter', ctrlKey: true, bubbles: true }));

    await saved;
    expect((await quotes())[0]).toEqual(jasmine.objectContaining({ bookId: fen, audioSeconds: 3750, chapter: 'Low Water', tags: ['fen', 'time'] }));
  });

  it('warns about a page past the book’s end, and keeps it when the reader saves again', async () => {
    const bookId = await store.create('books', { title: 'The Salt Road Almanac', authors: ['Ada Pell'], format: 'print', pageCount: 320, status: 'reading' });
    const saved = capture.open({ bookId });
    await until(() => find<HTMLSelectElement>('Book')?.value === bookId, 'the book to be chosen');
    type('The passage', 'Salt keeps what the sea forgets.');
    type('Page', '400');
    control('Page').dispatchEvent(new KeyboardEvent('keydown', { key: 'Enter', bubbles: true }));
    const warning = await until(() => dialog()?.querySelector('.page-warning[role="alert"]'), 'the warning');
    expect(warning.textContent).toContain('320 pages, so page 400 is past its end');
    expect(await quotes()).toEqual([]);
    control('Page').dispatchEvent(new KeyboardEvent('keydown', { key: 'Enter', bubbles: true }));
    const id = (await saved)!;
    expect((await store.get('quotes', id))?.page).toBe(400);
  });

  it('says what each field needs, and saves nothing until it is right', async () => {
    const bookId = await store.create('books', { title: 'Glasswing', format: 'print', status: 'reading' });
    void capture.open({ bookId, page: 12 });
    await until(() => find<HTMLSelectElement>('Book')?.value === bookId, 'the dialog');
    expect(control<HTMLInputElement>('Page').value).toBe('12');

    type('Page', 'forty');
    type('Tags', 'x'.repeat(61));
    dialog()!.querySelector<HTMLButtonElement>('button[type="submit"]')!.click();
    await until(() => errors().length === 3, 'three messages');
    expect(errors()).toEqual(['The passage is required', 'Use a page number such as 42', 'Keep each tag to 60 characters']);
    expect(dialog()!.querySelector('[role="alert"]')?.textContent).toContain('Some fields need attention.');
    expect(await quotes()).toEqual([]);

    // An ebook takes a location or a percent in the same field.
    const ebook = await store.create('books', { title: 'Moth Light', format: 'ebook', status: 'tbr' });
    await until(() => control<HTMLSelectElement>('Book').querySelector(`option[value="${ebook}"]`), 'the new book in the list');
    const select = control<HTMLSelectElement>('Book');
    select.value = ebook;
    select.dispatchEvent(new Event('change'));
    await until(() => find('Location or percent'), 'the ebook position field');
    type('Location or percent', '37%');
    type('Tags', 'moths');
    type('The passage', 'Every lamp is a small sun.');
    dialog()!.querySelector<HTMLButtonElement>('button[type="submit"]')!.click();
    await until(() => !dialog(), 'the dialog to close');
    const [quote] = await quotes();
    expect(quote).toEqual(jasmine.objectContaining({ bookId: ebook, ebookLocation: '37%', tags: ['moths'] }));
    expect(quote!.page ?? null).toBeNull();
  });

  it('while it holds a passage, keeps updates from reloading and a stray tap from closing it', async () => {
    const unsaved = TestBed.inject(UnsavedWork);
    const saved = capture.open();
    await until(() => find('The passage'), 'the dialog and its fields'); // the fields render after the dialog's host
    expect(unsaved.present()).toBeFalse();

    type('The passage', 'Half a thought');
    await until(() => unsaved.present(), 'unsaved work');
    document.querySelector<HTMLElement>('.cdk-overlay-backdrop')!.click();
    await TestBed.inject(ApplicationRef).whenStable();
    expect(dialog()).not.toBeNull();

    Array.from(dialog()!.querySelectorAll('button'))
      .find((button) => button.textContent?.trim() === 'Cancel')!
      .click();
    expect(await saved).toBeUndefined();
    await until(() => !dialog() && !unsaved.present(), 'the dialog gone and nothing unsaved');
    expect(await quotes()).toEqual([]);
  });

  it('edits a quote, sending only the fields the reader changed', async () => {
    const bookId = await store.create('books', { title: 'The Fen Hours', format: 'audiobook', status: 'finished' });
    const id = await store.create('quotes', { bookId, text: 'Reeds keep the time.', audioSeconds: 65, capturedAt: '2026-03-01T08:00:00.000Z' });
    const db = TestBed.inject(LocalJournal).db()!;
    const outboxBefore = await db.outbox.count();

    const saved = capture.edit((await store.get('quotes', id))!);
    await until(() => find<HTMLInputElement>('Audio position')?.value === '0:01:05', 'the stored position');
    expect(dialog()!.querySelector('h2')?.textContent).toBe('Edit quote');
    type('Note', 'For the fen walk');
    dialog()!.querySelector<HTMLButtonElement>('button[type="submit"]')!.click();

    expect(await saved).toBe(id);
    const changes = (await db.outbox.toArray()).slice(outboxBefore);
    expect(changes.map((change) => change.field)).toEqual(['note']);
    // The note is a mergeable text: the outbox carries a Yjs update, which Yjs itself reads back.
    const doc = loadTextDoc([decodeTextBytes((changes[0]!.value as { yjs: string }).yjs)!]);
    expect(textOf(doc, textDocName('quotes', id, 'note'))).toBe('For the fen walk');
  });
});
