import { HttpEventType } from '@angular/common/http';
import { ChangeDetectionStrategy, Component } from '@angular/core';
import { type ComponentFixture, TestBed } from '@angular/core/testing';
import { FormControl, ReactiveFormsModule } from '@angular/forms';

import type { JournalDb } from '../../data/journal-db';
import { patiently } from '../../testing/patience';
import { sha256Hex } from '../sha256-hex';
import { useCoverJournal } from '../testing/cover-journal';
import { drawnImage } from '../testing/test-images';
import { CoverPicker } from './cover-picker';

@Component({
  imports: [CoverPicker, ReactiveFormsModule],
  template: `<ll-cover-picker [formControl]="cover" title="Small Rain" />`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
class FormHost {
  readonly cover = new FormControl<string | null>(null);
}

describe('CoverPicker', () => {
  const covers = useCoverJournal();
  let root: () => HTMLElement;
  let stable: () => Promise<unknown>;

  const db = (): JournalDb => covers().journal.db;
  const query = <T extends Element>(selector: string) => root().querySelector<T>(selector);
  const text = (selector: string) => query(selector)?.textContent?.trim() ?? '';
  const offline = () => spyOnProperty(navigator, 'onLine').and.returnValue(false);

  const until = async (check: () => unknown, what: string) => {
    await patiently(what, check, stable);
  };

  const sent = (url: string) => covers().sent(url);

  /** Hands a file to one of the picker's inputs, as the browser's file dialog would. */
  function choose(label: string, file: File): void {
    const input = query<HTMLInputElement>(`input[aria-label="${label}"]`)!;
    const transfer = new DataTransfer();
    transfer.items.add(file);
    input.files = transfer.files;
    input.dispatchEvent(new Event('change'));
  }

  const picture = async (width = 120, height = 180) => new File([await drawnImage(width, height)], 'scan.png', { type: 'image/png' });
  const button = (name: string) => Array.from(root().querySelectorAll('button')).find((b) => b.textContent?.includes(name));

  function pickerAlone(coverId: string | null = null): { fixture: ComponentFixture<CoverPicker>; emitted: (string | null)[] } {
    const fixture = TestBed.createComponent(CoverPicker);
    fixture.componentRef.setInput('coverId', coverId);
    fixture.componentRef.setInput('title', 'The Glass Orchard');
    const emitted: (string | null)[] = [];
    fixture.componentInstance.coverId.subscribe((id) => emitted.push(id));
    root = () => fixture.nativeElement;
    stable = () => fixture.whenStable();
    return { fixture, emitted };
  }

  it('offers a file, the camera and a drop, each input labelled and taking images only', async () => {
    pickerAlone();
    await stable();
    const file = query<HTMLInputElement>('input[aria-label="Choose a cover image"]')!;
    const camera = query<HTMLInputElement>('input[aria-label="Take a photo"]')!;
    expect(file.accept).toBe('image/*');
    expect(camera.accept).toBe('image/*');
    expect(camera.getAttribute('capture')).toBe('environment');
    expect(button('Choose a cover image')).toBeDefined();
    expect(button('Take a photo')).toBeDefined();
    expect(button('Remove cover')).toBeUndefined();
  });

  it('saves a chosen image on this device, sends out its id and shows it, saying it uploads later', async () => {
    offline();
    const { emitted } = pickerAlone();
    choose('Choose a cover image', await picture());

    await until(() => emitted.length === 1, 'the new id');
    const id = emitted[0]!;
    expect((await db().covers.get(id))?.state).toBe('pending');
    await until(() => query<HTMLImageElement>('ll-book-cover img')?.src.startsWith('blob:'), 'the preview');
    await until(() => text('[role="status"]') === 'Saved on this device; uploads when you are online', 'the offline line');
    expect(button('Remove cover')).toBeDefined();
  });

  it('takes a photo through the camera input the same way', async () => {
    offline();
    const { emitted } = pickerAlone();
    choose('Take a photo', await picture(60, 80));
    await until(() => emitted.length === 1, 'the new id');
    expect(await db().covers.get(emitted[0]!)).toBeDefined();
  });

  it('takes an image dropped on it', async () => {
    offline();
    const { emitted } = pickerAlone();
    await stable();
    const transfer = new DataTransfer();
    transfer.items.add(await picture());
    const zone = query('.picker')!;
    const over = new DragEvent('dragover', { dataTransfer: transfer, cancelable: true });
    zone.dispatchEvent(over);
    expect(over.defaultPrevented).withContext('dragover allows the drop').toBeTrue();
    await until(() => query('.picker.dragging'), 'the drop highlight');

    const drop = new DragEvent('drop', { dataTransfer: transfer, cancelable: true });
    zone.dispatchEvent(drop);
    expect(drop.defaultPrevented).withContext('the browser does not open the file itself').toBeTrue();
    await until(() => emitted.length === 1, 'the new id');
    expect(query('.picker.dragging')).toBeNull();
  });

  it('refuses a bad file with a message and leaves the cover as it was', async () => {
    offline();
    const before = await drawnImage(30, 45, 'image/webp');
    const id = await sha256Hex(before);
    await db().covers.add({ id, blob: before, mediaType: 'image/webp', state: 'uploaded' });
    const { fixture, emitted } = pickerAlone(id);

    choose('Choose a cover image', new File(['%PDF-1.7 not a cover'], 'notes.pdf', { type: 'application/pdf' }));

    await until(() => query('[role="alert"]'), 'the message');
    expect(text('[role="alert"]')).toBe('This file is not an image Lamplight can read. Try a JPEG, PNG or WebP picture.');
    expect(emitted).toEqual([]);
    expect(fixture.componentInstance.coverId()).toBe(id);
    expect(await db().covers.count()).toBe(1);
    await until(() => query<HTMLImageElement>('ll-book-cover img'), 'the old cover still shown');
  });

  it('removes the cover with "Remove cover", sending out null', async () => {
    offline();
    const { fixture, emitted } = pickerAlone('e'.repeat(64));
    await stable();
    button('Remove cover')!.click();
    await stable();
    expect(emitted).toEqual([null]);
    expect(fixture.componentInstance.coverId()).toBeNull();
    expect(button('Remove cover')).toBeUndefined();
  });

  it('shows upload progress online, in percent, until the server has it', async () => {
    const { emitted } = pickerAlone();
    choose('Choose a cover image', await picture());
    await until(() => emitted.length === 1, 'the new id');
    const id = emitted[0]!;

    const upload = await sent('/api/uploads');
    upload.event({ type: HttpEventType.UploadProgress, loaded: 2, total: 5 });
    await until(() => query('mat-progress-bar')?.getAttribute('aria-valuenow') === '40', 'the progress bar at 40');
    expect(text('.percent')).toBe('40%');
    expect(text('[role="status"]')).toBe('Uploading the cover…');

    upload.flush({ id, mediaType: 'image/webp', byteSize: 5 }, { status: 201, statusText: 'Created' });
    await until(() => !query('mat-progress-bar') && text('[role="status"]') === '', 'the upload to finish');
    expect((await db().covers.get(id))?.state).toBe('uploaded');
  });

  it('says when the server refused the cover, and why', async () => {
    offline();
    const blob = await drawnImage(10, 15, 'image/webp');
    const id = await sha256Hex(blob);
    await db().covers.add({ id, blob, mediaType: 'image/webp', state: 'refused', problem: 'The image is larger than 2097152 bytes' });
    pickerAlone(id);
    await until(() => text('[role="status"]').startsWith('This cover'), 'the refusal');
    expect(text('[role="status"]')).toBe('This cover stays on this device only: The image is larger than 2097152 bytes');
  });

  it('works as a form control: shows the value, marks it dirty when changed, and is invalid while preparing', async () => {
    offline();
    const fixture = TestBed.createComponent(FormHost);
    root = () => fixture.nativeElement;
    stable = () => fixture.whenStable();
    const control = fixture.componentInstance.cover;
    control.setValue('f'.repeat(64));
    await stable();
    expect(button('Remove cover')).withContext('the written value shows').toBeDefined();

    choose('Choose a cover image', await picture());
    expect(control.invalid).withContext('while preparing').toBeTrue();
    await until(() => control.value !== 'f'.repeat(64), 'the new value');
    expect(control.value).toMatch(/^[0-9a-f]{64}$/);
    expect(control.dirty).toBeTrue();
    expect(control.valid).toBeTrue();

    control.disable();
    await stable();
    expect(button('Choose a cover image')!.disabled).toBeTrue();
  });
});
