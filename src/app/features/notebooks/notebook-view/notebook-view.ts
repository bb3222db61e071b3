import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { FormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { Router, RouterLink } from '@angular/router';
import { format } from 'date-fns';

import { NOTEBOOK_LIMITS } from '@shared/journal/notebook-limits';
import { STARTER_TEMPLATES } from '@shared/journal/starter-templates';

import { InvalidFieldsError } from '../../../core/data/field-errors';
import { JournalStore } from '../../../core/data/journal-store';
import { UnsavedWork } from '../../../core/pwa/unsaved-work';
import { LEAVE_WITHOUT_ASKING } from '../../../core/pwa/unsaved-work-guard';
import { notBlank, showServerErrors } from '../../../ui/field-errors';
import { RowChoiceField } from '../../../ui/row-choice-field/row-choice-field';
import { TextField } from '../../../ui/text-field/text-field';
import { notebookContents } from '../notebook-data';
import { Notebooks } from '../notebooks';
import { PageTemplates } from '../page-templates/page-templates';
import { liveQueryFor } from '../../../core/data/live-query-for';
import { undoableDelete } from '../../../ui/undoable-delete';

/** One notebook: its pages in order, adding and arranging them, and the notebook's title and book. */
@Component({
  selector: 'll-notebook-view',
  imports: [ReactiveFormsModule, RouterLink, MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule, PageTemplates, RowChoiceField, TextField],
  templateUrl: './notebook-view.html',
  styleUrl: './notebook-view.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NotebookView {
  /** The notebook's id, from the route. */
  readonly id = input.required<string>();

  private readonly store = inject(JournalStore);
  private readonly notebooks = inject(Notebooks);
  private readonly router = inject(Router);
  private readonly deleteWithUndo = undoableDelete();

  private readonly data = liveQueryFor(this.id, notebookContents);
  protected readonly notebook = computed(() => this.data()?.notebook);
  protected readonly pages = computed(() => this.data()?.pages ?? []);
  protected readonly books = computed(() => this.data()?.books ?? []);
  protected readonly ownTemplates = computed(() => this.data()?.templates ?? []);
  protected readonly starterTemplates = STARTER_TEMPLATES;
  protected readonly loaded = computed(() => this.data() !== undefined);
  protected readonly bookTitle = computed(() => {
    const bookId = this.notebook()?.bookId;
    return bookId ? (this.books().find((book) => book.id === bookId)?.title ?? null) : null;
  });

  /** Which template a new page starts from: '' for a blank page. */
  protected readonly startFrom = signal('');
  protected readonly editing = signal(false);
  protected readonly confirmingDelete = signal(false);
  protected readonly problem = signal('');
  protected readonly detailsForm = inject(FormBuilder).nonNullable.group({
    title: ['', [Validators.required, notBlank, Validators.maxLength(NOTEBOOK_LIMITS.notebookTitle)]],
    bookId: [''],
  });

  constructor() {
    inject(UnsavedWork).trackForm(this.detailsForm);
  }

  protected async addPage(): Promise<void> {
    const chosen = this.startFrom();
    const template = [...this.starterTemplates, ...this.ownTemplates()].find((t) => t.id === chosen) ?? null;
    try {
      const pageId = await this.notebooks.addPage(this.id(), template, format(new Date(), 'yyyy-MM-dd'));
      await this.router.navigate(['/journal/notebooks', this.id(), 'pages', pageId]);
    } catch {
      this.problem.set('This device could not add the page.');
    }
  }

  protected move(pageId: string, by: -1 | 1): Promise<void> {
    return this.notebooks.movePage(this.id(), pageId, by);
  }

  protected async removePage(page: { id: string; title: string }): Promise<void> {
    await this.deleteWithUndo('notebookPages', page.id, `Page “${page.title || 'Untitled page'}” deleted.`);
  }

  protected startEditing(): void {
    const notebook = this.notebook();
    this.detailsForm.reset({ title: notebook?.title ?? '', bookId: notebook?.bookId ?? '' });
    this.editing.set(true);
  }

  protected cancelEditing(): void {
    this.detailsForm.reset();
    this.editing.set(false);
  }

  protected async saveDetails(): Promise<void> {
    const form = this.detailsForm;
    form.markAllAsTouched();
    if (!form.controls.title.value.trim()) form.controls.title.setErrors({ required: true });
    if (form.invalid) return;
    const notebook = this.notebook();
    const value = form.getRawValue();
    // Only what the reader changed, so an edit from another device to the other field survives.
    const patch: { title?: string; bookId?: string | null } = {};
    if (value.title.trim() !== (notebook?.title ?? '')) patch.title = value.title.trim();
    if ((value.bookId || null) !== (notebook?.bookId ?? null)) patch.bookId = value.bookId || null;
    try {
      if (Object.keys(patch).length) await this.store.write('notebooks', this.id(), patch);
      this.cancelEditing();
    } catch (error) {
      if (error instanceof InvalidFieldsError) showServerErrors(form, error.fields);
      this.problem.set('This device could not save the notebook.');
    }
  }

  protected async removeNotebook(): Promise<void> {
    const title = this.notebook()?.title || 'Untitled notebook';
    await this.deleteWithUndo('notebooks', this.id(), `Notebook “${title}” deleted.`);
    // The reader chose to delete it, half-typed details and all.
    await this.router.navigate(['/journal/notebooks'], { info: LEAVE_WITHOUT_ASKING });
  }
}
