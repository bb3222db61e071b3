import { Component } from '@angular/core';
import { FormControl } from '@angular/forms';

import { renderHost } from '../testing/render-host';
import { ChoiceField, RATING_CHOICES, RATING_WORDS } from './choice-field';

@Component({
  imports: [ChoiceField],
  template: `
    <ll-choice-field class="rating" [control]="rating" label="Rating of the series" [choices]="ratings" [words]="ratingWords" none="No rating" />
    <ll-choice-field class="colour" [control]="colour" label="Colour" [choices]="['moss', 'slate']" [words]="{ moss: 'Moss' }" />
  `,
})
class Host {
  readonly rating = new FormControl('3.5', { nonNullable: true });
  readonly colour = new FormControl('slate', { nonNullable: true });
  readonly ratings = RATING_CHOICES;
  readonly ratingWords = RATING_WORDS;
}

describe('ChoiceField', () => {
  it('offers the empty choice first when asked, words for each choice, and reads and writes its control', async () => {
    const host = await renderHost(Host);
    expect(host.text('.rating mat-label')).toBe('Rating of the series');
    expect(host.optionTexts('.rating select')).toEqual([
      'No rating',
      '0.5 stars',
      '1 star',
      '1.5 stars',
      '2 stars',
      '2.5 stars',
      '3 stars',
      '3.5 stars',
      '4 stars',
      '4.5 stars',
      '5 stars',
    ]);
    const rating = host.find<HTMLSelectElement>('.rating select');
    expect(rating.value).toBe('3.5');
    // No empty option unless asked; a choice without words shows as it is.
    expect(host.optionTexts('.colour select')).toEqual(['Moss', 'slate']);

    rating.value = '';
    rating.dispatchEvent(new Event('change'));
    expect(host.fixture.componentInstance.rating.value).toBe('');
  });
});
