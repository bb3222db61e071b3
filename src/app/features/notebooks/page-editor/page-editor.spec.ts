import { TestBed, type ComponentFixture } from '@angular/core/testing';

import type { PageTemplate } from '@shared/sync/schema/collections';

import * as Y from 'yjs';

import { applyPulledTexts, textStatesOf } from '@shared/text/apply-pulled-texts';
import { localTextState } from '@shared/text/local-text';
import { loadTextDoc, textDocName } from '@shared/text/text-doc';
import { encodeTextBytes } from '@shared/text/text-value';

import { UnsavedWork } from '../../../core/pwa/unsaved-work';
import { patiently } from '../../../core/testing/patience';
import { Notebooks } from '../notebooks';
import { openTestJournal, textOf, until, type TestJournal } from '../../../core/testing/test-journal';
import { PageEditor } from './page-editor';

describe('PageEditor', () => {
  let journal: TestJournal;
  let fixture: ComponentFixture<PageEditor>;
  let element: HTMLElement;
  let notebookId: string;
  let pageId: string;

  beforeEach(async () => {
    journal = openTestJournal();
    const notebooks = TestBed.inject(Notebooks);
    notebookId = await notebooks.createNotebook('Coast reading', null);
    pageId = await notebooks.addPage(notebookId, null, '2026-03-08');
    await journal.store.write('notebookPages', pageId, { title: 'Harbour', body: 'Gulls.' });
  });
  afterEach(() => journal.close());

  async function open(page = pageId): Promise<void> {
    fixture = TestBed.createComponent(PageEditor);
    fixture.componentRef.setInput('id', notebookId);
    fixture.componentRef.setInput('pageId', page);
    element = fixture.nativeElement as HTMLElement;
    await until(() => !!element.querySelector('textarea, [role=alert]') && textOf(element.querySelector('.crumb')).includes('Coast reading'), fixture);
  }
  const textarea = () => element.querySelector<HTMLTextAreaElement>('textarea')!;
  const titleInput = () => element.querySelector<HTMLInputElement>('input')!;
  const type = (field: HTMLInputElement | HTMLTextAreaElement, value: string) => {
    field.value = value;
    field.dispatchEvent(new Event('input'));
  };
  const buttonNamed = (text: string) => Array.from(element.querySelectorAll('button')).find((b) => textOf(b).endsWith(text))!;

  it('shows the page, previews the formatting as it is typed, and saves only the changed field', async () => {
    await open();
    expect(titleInput().value).toBe('Harbour');
    expect(textarea().value).toBe('Gulls.');
    const unsaved = TestBed.inject(UnsavedWork);
    expect(unsaved.present()).toBeFalse();

    type(textarea(), '# Low tide\nGulls and **one heron**.\n[ ] come back at dawn');
    await until(() => !!element.querySelector('.preview strong'), fixture);
    expect(textOf(element.querySelector('.preview h3'))).toBe('Low tide');
    expect(textOf(element.querySelector('.preview strong'))).toBe('one heron');
    expect(unsaved.present()).toBeTrue();

    const before = await journal.db.outbox.count();
    buttonNamed('Save page').click();
    await until(() => textOf(element.querySelector('[role=status]')) === 'Saved on this device.', fixture);

    const changes = (await journal.db.outbox.toArray()).slice(before);
    expect(changes.map((c) => [c.rowId, c.field])).toEqual([[pageId, 'body']]);
    expect((await journal.store.get('notebookPages', pageId))?.body).toBe('# Low tide\nGulls and **one heron**.\n[ ] come back at dawn');
    expect(unsaved.present()).toBeFalse();
  });

  it('saves what was typed before the stored text reached the editor, rather than saying saved and dropping it', async () => {
    fixture = TestBed.createComponent(PageEditor);
    fixture.componentRef.setInput('id', notebookId);
    fixture.componentRef.setInput('pageId', pageId);
    element = fixture.nativeElement as HTMLElement;
    // The look that first finds the field types and saves in the same task: before the text
    // binding's read of the stored text can have answered.
    await patiently('the page field', () => (fixture.detectChanges(), element.querySelector('textarea')));
    type(textarea(), 'Gulls. A heron, early.');
    buttonNamed('Save page').click();
    await until(() => textOf(element.querySelector('[role=status]')) === 'Saved on this device.', fixture);

    expect((await journal.store.get('notebookPages', pageId))?.body).toBe('Gulls. A heron, early.');
  });

  it('shows a change from another device while the reader types, keeping the caret and the typed words', async () => {
    await open();
    const area = textarea();
    area.focus();
    type(area, 'Gulls. Terns.');
    area.setSelectionRange(13, 13);

    // Another device prepends a line; a pull stores its state as DexieSyncPorts.apply does.
    const name = textDocName('notebookPages', pageId, 'body');
    const row = (await journal.db.rows('notebookPages').get(pageId))!;
    const remote = loadTextDoc([localTextState(name, { state: textStatesOf(row)['body'], text: row['body'] as string })]);
    remote.getText(name).insert(0, 'Morning: ');
    const pulled = { field: 'body', value: 'Morning: Gulls.', hlc: '999999999999999:00000:other', state: encodeTextBytes(Y.encodeStateAsUpdate(remote)) };
    await journal.db.rows('notebookPages').put(applyPulledTexts('notebookPages', row, [pulled]));

    await until(() => area.value === 'Morning: Gulls. Terns.', fixture);
    // The caret stays after "Terns." (Yjs relative positions), 9 characters further on.
    expect([area.selectionStart, area.selectionEnd]).toEqual([22, 22]);

    buttonNamed('Save page').click();
    await until(() => textOf(element.querySelector('[role=status]')) === 'Saved on this device.', fixture);
    expect((await journal.store.get('notebookPages', pageId))?.body).toBe('Morning: Gulls. Terns.');
    const last = (await journal.db.outbox.toArray()).at(-1)!;
    expect(last.field).toBe('body');
    expect(Object.keys(last.value as object)).toEqual(['yjs']);
  });

  it('says what is wrong per field and saves nothing', async () => {
    await open();
    type(titleInput(), 't'.repeat(301));
    type(textarea(), 'b'.repeat(50_001));
    const before = await journal.db.outbox.count();
    buttonNamed('Save page').click();
    await until(() => element.querySelectorAll('mat-error').length === 2, fixture);
    expect(Array.from(element.querySelectorAll('mat-error')).map(textOf)).toEqual(['Use at most 300 characters', 'Use at most 50000 characters']);
    expect(textOf(element.querySelector('.problem'))).toBe('Some fields need attention.');
    expect(await journal.db.outbox.count()).toBe(before);
  });

  it('saves the page, as it is now, as a template of the reader’s own', async () => {
    await open();
    type(textarea(), '## Birds seen\n- ');
    buttonNamed('Save this page as a template').click();
    await until(() => !!element.querySelector('form.template input'), fixture);
    const name = element.querySelector<HTMLInputElement>('form.template input')!;
    expect(name.value).toBe('Harbour');

    type(name, '');
    buttonNamed('Save template').click();
    await until(() => textOf(element.querySelector('form.template mat-error')) === 'A name is required', fixture);

    type(name, 'Birding');
    buttonNamed('Save template').click();
    await until(() => textOf(element.querySelector('[role=status]')).startsWith('Saved as the template “Birding”'), fixture);
    const [template] = (await journal.store.list('pageTemplates')) as PageTemplate[];
    expect(template).toEqual(jasmine.objectContaining({ name: 'Birding', title: 'Harbour', body: '## Birds seen\n- ' }));
    expect(element.querySelector('form.template')).toBeNull();
  });

  it('says so when the page is not on this device', async () => {
    await open('00000000-0000-4000-8000-000000000000');
    expect(textOf(element.querySelector('[role=alert]'))).toContain('This page is not on this device');
  });
});
