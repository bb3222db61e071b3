import { Component } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { FormControl } from '@angular/forms';

import { RowChoiceField } from './row-choice-field';

@Component({
  imports: [RowChoiceField],
  template: `
    <ll-row-choice-field class="book" [control]="book" label="Which book" none="Choose a book" [rows]="books" hint="Optional" />
    <ll-row-choice-field class="quote" [control]="quote" label="Which quote" none="Choose a quote" [rows]="quotes" [text]="firstWord" />
  `,
})
class Host {
  readonly book = new FormControl('b2', { nonNullable: true });
  readonly quote = new FormControl('', { nonNullable: true });
  readonly books = [
    { id: 'b1', title: 'The Salt Roads' },
    { id: 'b2', title: null },
  ];
  readonly quotes = [{ id: 'q1', text: 'Lanterns swung over the quay.' }];
  readonly firstWord = (quote: { text: string }) => quote.text.split(' ')[0]!;
}

describe('RowChoiceField', () => {
  it("offers `none` first, then each row by its title or `text`, and reads and writes the row's id", async () => {
    const fixture = TestBed.createComponent(Host);
    await fixture.whenStable();
    const element: HTMLElement = fixture.nativeElement;
    const book = element.querySelector<HTMLSelectElement>('.book select')!;
    const quote = element.querySelector<HTMLSelectElement>('.quote select')!;
    expect(element.querySelector('.book mat-label')?.textContent?.trim()).toBe('Which book');
    expect(element.querySelector('.book mat-hint')?.textContent?.trim()).toBe('Optional');
    expect(element.querySelector('.quote mat-hint')).toBeNull();
    expect([...book.options].map((option) => [option.value, option.textContent?.trim()])).toEqual([
      ['', 'Choose a book'],
      ['b1', 'The Salt Roads'],
      ['b2', ''],
    ]);
    expect(book.value).toBe('b2');
    expect([...quote.options].map((option) => option.textContent?.trim())).toEqual(['Choose a quote', 'Lanterns']);

    quote.value = 'q1';
    quote.dispatchEvent(new Event('change'));
    expect(fixture.componentInstance.quote.value).toBe('q1');
  });
});
