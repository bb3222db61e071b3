import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';

import { NOTEBOOK_LIMITS } from '@shared/journal/notebook-limits';
import { STARTER_TEMPLATES, type TemplateView } from '@shared/journal/starter-templates';

import { liveQuerySignal } from '../../../core/data/live-query';
import { UnsavedWork } from '../../../core/pwa/unsaved-work';
import { fieldError, notBlank } from '../../../ui/field-errors';
import { Notebooks } from '../notebooks';
import { ownPageTemplates } from '../notebook-data';
import { undoableDelete } from '../../../ui/undoable-delete';

/** The reader's own page templates: rename or delete them. The starter ones are listed as they are. */
@Component({
  selector: 'll-page-templates',
  imports: [ReactiveFormsModule, MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule],
  templateUrl: './page-templates.html',
  styleUrl: './page-templates.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PageTemplates {
  private readonly notebooks = inject(Notebooks);
  private readonly deleteWithUndo = undoableDelete();

  protected readonly own = liveQuerySignal(ownPageTemplates, [] as TemplateView[]);
  protected readonly starters = STARTER_TEMPLATES;
  /** The template being renamed, if any: one at a time. */
  protected readonly renaming = signal<string | null>(null);
  protected readonly name = new FormControl('', {
    nonNullable: true,
    validators: [Validators.required, notBlank, Validators.maxLength(NOTEBOOK_LIMITS.templateName)],
  });
  protected readonly renameForm = new FormGroup({ name: this.name });
  protected readonly fieldError = fieldError;

  constructor() {
    inject(UnsavedWork).trackForm(this.name);
  }

  protected startRenaming(template: TemplateView): void {
    this.renaming.set(template.id);
    this.name.reset(template.name);
  }

  protected cancel(): void {
    this.renaming.set(null);
    this.name.reset('');
  }

  protected async rename(template: TemplateView): Promise<void> {
    this.name.markAsTouched();
    if (!this.name.value.trim()) this.name.setErrors({ required: true });
    if (this.name.invalid) return;
    if (this.name.value.trim() !== template.name) await this.notebooks.renameTemplate(template.id, this.name.value);
    this.cancel();
  }

  protected async remove(template: TemplateView): Promise<void> {
    await this.deleteWithUndo('pageTemplates', template.id, `Template “${template.name}” deleted.`);
  }
}
