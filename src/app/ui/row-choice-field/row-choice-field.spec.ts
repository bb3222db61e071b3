import { Component } from '@angular/core';
import { FormControl } from '@angular/forms';

import { renderHost } from '../testing/render-host';
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
    const host = await renderHost(Host);
    expect(host.text('.book mat-label')).toBe('Which book');
    expect(host.text('.book mat-hint')).toBe('Optional');
    expect(host.text('.quote mat-hint')).toBeUndefined();
    expect(host.optionTexts('.book select')).toEqual(['Choose a book', 'The Salt Roads', '']);
    expect([...host.find<HTMLSelectElement>('.book select').options].map((option) => option.value)).toEqual(['', 'b1', 'b2']);
    expect(host.find<HTMLSelectElement>('.book select').value).toBe('b2');
    expect(host.optionTexts('.quote select')).toEqual(['Choose a quote', 'Lanterns']);

    const quote = host.find<HTMLSelectElement>('.quote select');
    quote.value = 'q1';
    quote.dispatchEvent(new Event('change'));
    expect(host.fixture.componentInstance.quote.value).toBe('q1');
  });
});
