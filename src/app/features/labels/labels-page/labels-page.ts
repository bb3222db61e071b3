import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { FormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';

import { LABEL_COLOURS, LABEL_ICONS, type Label } from '@shared/sync/schema/collections';

import { JournalStore } from '../../../core/data/journal-store';
import { notBlank } from '../../../ui/field-errors';
import { TextField } from '../../../ui/text-field/text-field';
import { undoableDelete } from '../../../ui/undoable-delete';
import { LabelDirectory, type LabelView } from '../../../core/read-model/label-directory';
import { ChoiceField } from '../../../ui/choice-field/choice-field';

/** Words for our colours and icons, so choices read well to everyone. */
const COLOUR_NAMES: Record<NonNullable<Label['colour']>, string> = {
  amber: 'Amber',
  rose: 'Rose',
  sage: 'Sage',
  teal: 'Teal',
  sky: 'Sky',
  plum: 'Plum',
  slate: 'Slate',
  sand: 'Sand',
};
const ICON_NAMES: Record<NonNullable<Label['icon']>, string> = {
  star: 'Star',
  repeat: 'Again',
  group: 'Together',
  favorite: 'Heart',
  bolt: 'Spark',
  spa: 'Leaf',
  local_cafe: 'Cup',
  flag: 'Flag',
  auto_stories: 'Open book',
  bookmark: 'Bookmark',
};

/** The reader's labels: our starter set and their own, to rename, recolour, add or remove. */
@Component({
  selector: 'll-labels-page',
  imports: [ChoiceField, ReactiveFormsModule, MatButtonModule, MatIconModule, TextField],
  templateUrl: './labels-page.html',
  styleUrl: './labels-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LabelsPage {
  private readonly store = inject(JournalStore);
  private readonly deleteWithUndo = undoableDelete();
  protected readonly directory = inject(LabelDirectory);
  protected readonly colours = LABEL_COLOURS;
  protected readonly icons = LABEL_ICONS;
  protected readonly colourNames = COLOUR_NAMES;
  protected readonly iconNames = ICON_NAMES;
  protected readonly editing = signal<string | null>(null);

  protected readonly form = inject(FormBuilder).nonNullable.group({
    name: ['', [Validators.required, notBlank, Validators.maxLength(40)]],
    colour: 'amber' as NonNullable<Label['colour']>,
    icon: 'bookmark' as NonNullable<Label['icon']>,
  });

  protected startNew(): void {
    this.editing.set('new');
    this.form.reset({ name: '', colour: 'amber', icon: 'bookmark' });
  }

  protected edit(label: LabelView): void {
    this.editing.set(label.id);
    this.form.reset({ name: label.name, colour: label.colour, icon: label.icon });
  }

  protected async save(): Promise<void> {
    this.form.markAllAsTouched();
    const id = this.editing();
    if (this.form.invalid || !id) return;
    const value = { ...this.form.getRawValue(), name: this.form.getRawValue().name.trim() };
    if (id === 'new') await this.store.create('labels', value);
    else {
      // A starter label has no row until first changed: write every field so the row is whole.
      await this.store.write('labels', id, { ...value, deleted: false });
    }
    this.editing.set(null);
  }

  protected async remove(label: LabelView): Promise<void> {
    // A starter label has no row until first changed: make it whole first, so Trash can name it.
    await this.store.write('labels', label.id, { name: label.name, colour: label.colour, icon: label.icon });
    await this.deleteWithUndo('labels', label.id, `Label “${label.name}” removed.`);
  }
}
