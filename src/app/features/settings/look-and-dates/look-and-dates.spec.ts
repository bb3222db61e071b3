import { TestBed } from '@angular/core/testing';

import { ApplyTheme } from '../../../core/settings/apply-theme';
import { BROWSER_LOCALE, READER_SETTINGS_ID } from '../../../core/settings/reader-settings';
import { openTestJournal, type TestJournal, waitFor } from '../../../core/testing/test-journal';
import { TIME_ZONE } from '../../../core/time/time-zone';
import { LookAndDates } from './look-and-dates';

describe('LookAndDates (Settings › Dates and look)', () => {
  let journal: TestJournal;
  beforeEach(() => {
    journal = openTestJournal([
      { provide: BROWSER_LOCALE, useValue: 'en-US' },
      { provide: TIME_ZONE, useValue: 'UTC' },
    ]);
  });
  afterEach(() => journal.close());

  it('starts from the browser’s locale and saves the reader’s choice in their synced settings', async () => {
    const fixture = TestBed.createComponent(LookAndDates);
    const element = fixture.nativeElement as HTMLElement;
    const select = element.querySelector<HTMLSelectElement>('select#date-locale')!;
    await fixture.whenStable();

    expect(element.querySelector('label[for="date-locale"]')?.textContent).toContain('Dates and times');
    expect(select.getAttribute('aria-describedby')).toBe('date-locale-hint');
    expect(select.options[0]!.textContent).toContain('As this browser: Mar 8, 2026, 4:45 PM');

    select.value = 'de';
    select.dispatchEvent(new Event('change'));
    await waitFor(fixture, async () => (await journal.db.rows('readerSettings').get(READER_SETTINGS_ID))?.['dateLocale'] === 'de', 'the choice saved');
    await waitFor(fixture, () => element.querySelector('#date-locale-hint')?.textContent?.match(/\d{1,2}\.\d{1,2}\.\d{4}|\d+\. \w+/), 'the hint in German dates');
  });
});

describe('LookAndDates › Colours', () => {
  let journal: TestJournal;
  beforeEach(() => {
    journal = openTestJournal();
  });
  afterEach(async () => {
    await journal.close();
    document.documentElement.removeAttribute('style');
    delete document.documentElement.dataset['theme'];
  });

  it('offers the device’s light/dark and our three themes as one radio group; a choice is synced and put on the page', async () => {
    TestBed.inject(ApplyTheme);
    const fixture = TestBed.createComponent(LookAndDates);
    const element = fixture.nativeElement as HTMLElement;
    await fixture.whenStable();
    const group = element.querySelector('fieldset.themes')!;
    const radios = Array.from(group.querySelectorAll<HTMLInputElement>('input[type="radio"][name="theme"]'));

    expect(group.querySelector('legend')?.textContent).toBe('Colours');
    expect(radios.map((radio) => radio.value)).toEqual(['system', 'lamplight', 'moss', 'harbour']);
    expect(radios[0]!.checked).toBeTrue();

    radios[2]!.click();
    await waitFor(fixture, async () => (await journal.db.rows('readerSettings').get(READER_SETTINGS_ID))?.['theme'] === 'moss', 'the theme saved');
    await waitFor(fixture, () => document.documentElement.dataset['theme'] === 'moss', 'the theme on the page');
    expect(document.documentElement.style.getPropertyValue('--mat-sys-primary')).toBe('#2f5d3a');
    expect(document.documentElement.style.getPropertyValue('color-scheme')).toBe('light');

    radios[0]!.click();
    await waitFor(fixture, () => document.documentElement.dataset['theme'] === undefined, 'back to the device’s colours');
    expect(document.documentElement.style.getPropertyValue('--mat-sys-primary')).toBe('');
  });
});
