import { type ComponentFixture, TestBed } from '@angular/core/testing';

import { readerAt } from '../../core/testing/reader-moment';
import { openTestJournal, waitFor, type TestJournal } from '../../core/testing/test-journal';
import { Today } from './today';

describe('Today', () => {
  const NOW = Date.parse('2026-03-08T20:00:00Z');
  let fixture: ComponentFixture<Today>;
  let journal: TestJournal;

  const panels = (): HTMLElement => (fixture.nativeElement as HTMLElement).querySelector('.panels')!;

  beforeEach(() => {
    journal = openTestJournal(readerAt(NOW));
  });

  afterEach(async () => {
    await journal.close();
  });

  it('keeps its panels hidden until the loans card and In progress have read the journal, then shows them together', async () => {
    await journal.store.create('books', { title: 'The Salt Road', format: 'print', pageCount: 300, status: 'reading' });
    fixture = TestBed.createComponent(Today);
    fixture.detectChanges();
    // Before the journal answers: laid out but not shown, so a late card cannot push a shown one down.
    expect(panels().classList).toContain('waiting');
    expect(getComputedStyle(panels()).visibility).toBe('hidden');
    expect(panels().getAttribute('aria-busy')).toBe('true');
    await waitFor(fixture, () => !panels().classList.contains('waiting'), 'the panels shown');
    // Shown only with their answers in: the book being read is there at once.
    expect(panels().querySelector('ll-in-progress li')?.textContent).toContain('The Salt Road');
    expect(getComputedStyle(panels()).visibility).toBe('visible');
    expect(panels().getAttribute('aria-busy')).toBe('false');
  });
});
