import { ChangeDetectionStrategy, Component, computed, forwardRef, inject, input, model, signal } from '@angular/core';
import { NG_VALIDATORS, NG_VALUE_ACCESSOR, type ControlValueAccessor, type ValidationErrors, type Validator } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';

import { BookCover } from '../book-cover/book-cover';
import { CoverError } from '../cover-error';
import { Covers } from '../covers';
import { liveCover } from '../live-cover';

/**
 * Chooses a book's cover: from a file, the camera or a drop. The image is prepared and saved on
 * this device at once, and the new id (or `null` after "Remove cover") goes out through
 * `coverId`. Works with `[(coverId)]` or as a form control; while an image is being prepared
 * the control is invalid, so a form is not saved without it. A bad file leaves the cover as it
 * was and says why.
 */
@Component({
  selector: 'll-cover-picker',
  imports: [BookCover, MatButtonModule, MatIconModule, MatProgressBarModule],
  templateUrl: './cover-picker.html',
  styleUrl: './cover-picker.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  providers: [
    { provide: NG_VALUE_ACCESSOR, useExisting: forwardRef(() => CoverPicker), multi: true },
    { provide: NG_VALIDATORS, useExisting: forwardRef(() => CoverPicker), multi: true },
  ],
})
export class CoverPicker implements ControlValueAccessor, Validator {
  /** The chosen cover's id, or `null` for none. */
  readonly coverId = model<string | null>(null);
  /** The book's title, for the preview's placeholder. */
  readonly title = input<string | null | undefined>('');

  private readonly covers = inject(Covers);
  private readonly stored = liveCover(this.coverId);
  private onChange: (id: string | null) => void = () => undefined;
  private onTouched: () => void = () => undefined;
  private onValidatorChange: () => void = () => undefined;

  protected readonly preparing = signal(false);
  protected readonly problem = signal<string | null>(null);
  protected readonly dragging = signal(false);
  protected readonly disabled = signal(false);
  /** Upload progress of the shown cover in percent, while it uploads. */
  protected readonly percent = computed(() => {
    const id = this.coverId();
    const fraction = id ? this.covers.uploadProgress().get(id) : undefined;
    return fraction === undefined ? null : Math.round(fraction * 100);
  });
  /** Where the shown cover is: only here, on its way, or refused by the server. */
  protected readonly whereabouts = computed(() => {
    const cover = this.stored();
    if (!cover || cover.id !== this.coverId()) return null;
    if (cover.state === 'refused') return `This cover stays on this device only: ${cover.problem ?? 'the server did not take it'}`;
    if (cover.state === 'uploaded') return null;
    if (!this.covers.online()) return 'Saved on this device; uploads when you are online';
    // The percentage is on the progress bar: a live line that changed with it would chatter.
    return this.percent() === null ? 'Saved on this device; uploading soon' : 'Uploading the cover…';
  });

  /** A file from either input. Cleared afterwards, so choosing the same file again still counts. */
  protected picked(input: HTMLInputElement): void {
    const file = input.files?.[0];
    input.value = '';
    if (file) void this.take(file);
  }

  protected dragOver(event: DragEvent): void {
    if (!event.dataTransfer?.types.includes('Files') || this.disabled()) return;
    event.preventDefault(); // allows the drop
    event.dataTransfer.dropEffect = 'copy';
    this.dragging.set(true);
  }

  protected dropped(event: DragEvent): void {
    event.preventDefault(); // or the browser opens the file in place of the app
    this.dragging.set(false);
    const file = event.dataTransfer?.files[0];
    if (file && !this.disabled()) void this.take(file);
  }

  protected remove(): void {
    this.problem.set(null);
    this.choose(null);
  }

  private async take(file: File): Promise<void> {
    this.problem.set(null);
    this.setPreparing(true);
    try {
      this.choose(await this.covers.save(file));
    } catch (error) {
      this.problem.set(error instanceof CoverError ? error.message : 'This device could not keep that image. The cover was not changed.');
    } finally {
      this.setPreparing(false);
    }
  }

  private choose(id: string | null): void {
    this.coverId.set(id);
    this.onChange(id);
    this.onTouched();
  }

  private setPreparing(preparing: boolean): void {
    this.preparing.set(preparing);
    this.onValidatorChange();
  }

  /** @internal Forms API. */
  writeValue(id: string | null | undefined): void {
    this.coverId.set(id ?? null);
  }

  /** @internal Forms API. */
  registerOnChange(fn: (id: string | null) => void): void {
    this.onChange = fn;
  }

  /** @internal Forms API. */
  registerOnTouched(fn: () => void): void {
    this.onTouched = fn;
  }

  /** @internal Forms API. */
  setDisabledState(disabled: boolean): void {
    this.disabled.set(disabled);
  }

  /** @internal Forms API: invalid while an image is being prepared. */
  validate(): ValidationErrors | null {
    return this.preparing() ? { coverPreparing: true } : null;
  }

  /** @internal Forms API. */
  registerOnValidatorChange(fn: () => void): void {
    this.onValidatorChange = fn;
  }
}
