import { ChangeDetectionStrategy, Component, effect, inject, input, signal, viewChild } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { FormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { RouterLink } from '@angular/router';
import { startWith } from 'rxjs';

import { TEMPLATE_PLACEHOLDERS } from '@shared/journal/instantiate-template';
import { NOTEBOOK_LIMITS } from '@shared/journal/notebook-limits';

import { InvalidFieldsError } from '../../../core/data/field-errors';
import { JournalStore } from '../../../core/data/journal-store';
import { UnsavedWork } from '../../../core/pwa/unsaved-work';
import { MergeableTextarea } from '../../../core/text/mergeable-textarea';
import { PageHistory } from '../page-history/page-history';
import { fieldError, notBlank, showServerErrors } from '../../../ui/field-errors';
import { TextField } from '../../../ui/text-field/text-field';
import { LightText } from '../light-text/light-text';
import { clip } from '../notebook-data';
import { Notebooks } from '../notebooks';
import { changedPageFields, toPageForm, type PageFormValue } from './page-form-model';

/** One notebook page: its title and text, with the formatting shown as it will look. */
@Component({
  selector: 'll-page-editor',
  imports: [
    ReactiveFormsModule,
    RouterLink,
    MatButtonModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    LightText,
    MergeableTextarea,
    PageHistory,
    TextField,
  ],
  templateUrl: './page-editor.html',
  styleUrl: './page-editor.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PageEditor {
  private readonly store = inject(JournalStore);
  private readonly notebooks = inject(Notebooks);

  /** The notebook's id, from the route. */
  readonly id = input.required<string>();
  /** The page's id, from the route. */
  readonly pageId = input.required<string>();

  protected readonly limits = NOTEBOOK_LIMITS;
  protected readonly placeholders = TEMPLATE_PLACEHOLDERS.map((placeholder) => ({ ...placeholder, typed: `{{${placeholder.name}}}` }));
  private readonly formBuilder = inject(FormBuilder).nonNullable;
  protected readonly form = this.formBuilder.group({
    title: ['', Validators.maxLength(NOTEBOOK_LIMITS.pageTitle)],
    body: ['', Validators.maxLength(NOTEBOOK_LIMITS.pageBody)],
  });
  protected readonly templateForm = this.formBuilder.group({
    name: ['', [Validators.required, notBlank, Validators.maxLength(NOTEBOOK_LIMITS.templateName)]],
  });
  private readonly templateName = this.templateForm.controls.name;
  /** The body as typed, for the preview. */
  protected readonly body = toSignal(this.form.controls.body.valueChanges.pipe(startWith(this.form.controls.body.value)), { initialValue: '' });
  protected readonly notebookTitle = signal('');
  protected readonly state = signal<'loading' | 'ready' | 'missing'>('loading');
  protected readonly status = signal('');
  protected readonly problem = signal('');
  protected readonly namingTemplate = signal(false);
  protected readonly fieldError = fieldError;
  private original: PageFormValue = { title: '', body: '' };
  /** The body's Yjs binding: typed edits are saved as character edits that merge. */
  private readonly bodyText = viewChild(MergeableTextarea);

  constructor() {
    // Nothing typed here may be lost to an update reload or another tab's upgrade.
    inject(UnsavedWork).trackForm(this.form, this.templateForm);
    effect(() => void this.load(this.id(), this.pageId()));
  }

  private async load(notebookId: string, pageId: string): Promise<void> {
    const [page, notebook] = await Promise.all([this.store.get('notebookPages', pageId), this.store.get('notebooks', notebookId)]);
    this.notebookTitle.set(notebook?.title ?? '');
    if (!page || page.deleted || page.notebookId !== notebookId) {
      this.state.set('missing');
      return;
    }
    this.original = toPageForm(page);
    this.form.reset(this.original);
    this.state.set('ready');
  }

  protected async save(): Promise<void> {
    this.form.markAllAsTouched();
    this.status.set('');
    if (this.form.invalid) {
      this.problem.set('Some fields need attention.');
      return;
    }
    const value = this.form.getRawValue();
    try {
      // The body is saved as the edits typed here; changes from elsewhere are already stored.
      const { body: _typed, ...patch }: Record<string, unknown> = changedPageFields(this.original, value);
      await this.bodyText()?.whenLoaded(); // typed before the stored text arrived is an edit only then
      const edits = this.bodyText()?.pendingEdits();
      if (edits) patch['body'] = edits.value;
      if (Object.keys(patch).length) await this.store.write('notebookPages', this.pageId(), patch);
      if (edits) this.bodyText()?.saved(edits);
      this.original = value;
      this.form.markAsPristine();
      this.problem.set('');
      this.status.set('Saved on this device.');
    } catch (error) {
      if (error instanceof InvalidFieldsError) showServerErrors(this.form, error.fields);
      this.problem.set('This page could not be saved. What was saved before is unchanged.');
    }
  }

  /** A version from the history becomes the page's text: an edit like any other, saved at once. */
  protected async restoreVersion(text: string): Promise<void> {
    this.bodyText()?.replaceAll(text);
    await this.save();
  }

  protected startTemplate(): void {
    this.templateName.reset(clip(this.form.controls.title.value.trim(), NOTEBOOK_LIMITS.templateName));
    this.namingTemplate.set(true);
  }

  protected cancelTemplate(): void {
    this.templateName.reset('');
    this.namingTemplate.set(false);
  }

  protected async saveTemplate(): Promise<void> {
    const control = this.templateName;
    control.markAsTouched();
    if (!control.value.trim()) control.setErrors({ required: true });
    if (control.invalid || this.form.invalid) return;
    const name = control.value.trim();
    try {
      await this.notebooks.saveTemplate(name, this.form.getRawValue());
      this.cancelTemplate();
      this.status.set(`Saved as the template “${name}”. Start a page from it in any notebook.`);
    } catch {
      this.problem.set('This device could not save the template.');
    }
  }
}
