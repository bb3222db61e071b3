import { TestBed } from '@angular/core/testing';

import { STARTER_TEMPLATES } from '@shared/journal/starter-templates';

import { Notebooks } from '../notebooks';
import { openTestJournal, textOf, until, type TestJournal } from '../../../core/testing/test-journal';
import { PageTemplates } from './page-templates';

describe('PageTemplates', () => {
  let journal: TestJournal;
  beforeEach(() => (journal = openTestJournal()));
  afterEach(() => journal.close());

  it('renames and deletes the reader’s own templates, and lists the starter ones as they are', async () => {
    const notebooks = TestBed.inject(Notebooks);
    const id = await notebooks.saveTemplate('Commute', { title: 'On the train', body: '' });
    await notebooks.saveTemplate('Bedtime', { title: '', body: '' });
    const fixture = TestBed.createComponent(PageTemplates);
    const element = fixture.nativeElement as HTMLElement;
    const names = () => Array.from(element.querySelectorAll('.templates .name')).map(textOf);
    const button = (label: string) => element.querySelector<HTMLButtonElement>(`button[aria-label="${label}"]`)!;
    await until(() => names().length === 2, fixture);

    expect(names()).toEqual(['Bedtime', 'Commute']);
    expect(Array.from(element.querySelectorAll('.starters li')).map(textOf)).toEqual(STARTER_TEMPLATES.map((t) => t.name));

    button('Rename template Commute').click();
    await until(() => !!element.querySelector('form.rename input'), fixture);
    const input = element.querySelector<HTMLInputElement>('form.rename input')!;
    expect(input.value).toBe('Commute');
    input.value = 'x'.repeat(121);
    input.dispatchEvent(new Event('input'));
    element.querySelector<HTMLButtonElement>('form.rename button[type=submit]')!.click();
    await until(() => textOf(element.querySelector('form.rename mat-error')) === 'Use at most 120 characters', fixture);

    input.value = 'Train rides';
    input.dispatchEvent(new Event('input'));
    element.querySelector<HTMLButtonElement>('form.rename button[type=submit]')!.click();
    await until(() => names().includes('Train rides'), fixture);
    expect((await journal.store.get('pageTemplates', id))?.name).toBe('Train rides');

    button('Delete template Bedtime').click();
    await until(() => names().length === 1, fixture);
    expect(names()).toEqual(['Train rides']);
  });
});
