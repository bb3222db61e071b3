import { type ComponentFixture, TestBed } from '@angular/core/testing';

import type { JournalDb } from '../../data/journal-db';
import { waitFor } from '../../testing/test-journal';
import { placeholderColour } from '../cover-placeholder';
import { sha256Hex } from '../sha256-hex';
import { useCoverJournal } from '../testing/cover-journal';
import { drawnImage } from '../testing/test-images';
import { BookCover } from './book-cover';

describe('BookCover', () => {
  let fixture: ComponentFixture<BookCover>;
  const covers = useCoverJournal();

  const turn = () => new Promise((resolve) => setTimeout(resolve, 5));
  const db = (): JournalDb => covers().journal.db;
  const element = (): HTMLElement => fixture.nativeElement;
  const image = () => element().querySelector('img');
  const placeholder = () => element().querySelector<HTMLElement>('.placeholder');

  const until = (check: () => unknown, what: string) => waitFor(fixture, check, what);

  const sent = (url: string) => covers().sent(url);

  async function loaded(img: HTMLImageElement): Promise<void> {
    if (!img.complete) await new Promise((resolve) => img.addEventListener('load', resolve, { once: true }));
  }

  async function storedCover(): Promise<string> {
    const blob = await drawnImage(40, 60, 'image/webp');
    const id = await sha256Hex(blob);
    await db().covers.add({ id, blob, mediaType: 'image/webp', state: 'uploaded' });
    return id;
  }

  function show(inputs: { coverId: string | null; title: string; decorative?: boolean }): void {
    fixture = TestBed.createComponent(BookCover);
    fixture.componentRef.setInput('coverId', inputs.coverId);
    fixture.componentRef.setInput('title', inputs.title);
    if (inputs.decorative) fixture.componentRef.setInput('decorative', true);
  }

  it('shows the cover stored on this device, from a blob: URL, described by the title', async () => {
    const id = await storedCover();
    show({ coverId: id, title: 'The Glass Orchard' });

    await until(image, 'the image');
    const img = image()!;
    expect(img.src).toMatch(/^blob:/);
    expect(img.alt).toBe('Cover of The Glass Orchard');
    await loaded(img);
    expect([img.naturalWidth, img.naturalHeight]).toEqual([40, 60]);
    expect(placeholder()).toBeNull();
  });

  it('stands in with the title’s initials on its colour when the book has no cover', async () => {
    show({ coverId: null, title: 'Small Rain' });
    await until(placeholder, 'the placeholder');

    expect(placeholder()!.textContent!.trim()).toBe('SR');
    expect(placeholder()!.getAttribute('aria-hidden')).toBe('true');
    // Computed styles come back as rgb(); compare through the same conversion.
    const probe = document.createElement('span');
    probe.style.backgroundColor = placeholderColour('Small Rain');
    expect(placeholder()!.style.backgroundColor).toBe(probe.style.backgroundColor);
    expect(image()).toBeNull();
  });

  it('fetches a cover this device lacks, shows it when it arrives, and asks no more', async () => {
    const blob = await drawnImage(40, 60, 'image/webp');
    const id = await sha256Hex(blob);
    show({ coverId: id, title: 'Kindred' });
    await until(placeholder, 'the placeholder');

    (await sent(`/api/uploads/${id}`)).flush(blob);
    await until(image, 'the fetched image');
    await loaded(image()!);
    expect(image()!.naturalWidth).toBe(40);
    expect((await db().covers.get(id))?.state).toBe('uploaded');
  });

  it('keeps the placeholder when the server does not have the cover', async () => {
    const id = 'd'.repeat(64);
    show({ coverId: id, title: 'Beloved' });
    const notFound = new Blob([JSON.stringify({ error: { code: 'not_found', message: 'No such upload' } })], { type: 'application/json' });
    (await sent(`/api/uploads/${id}`)).flush(notFound, { status: 404, statusText: 'Not Found' });
    await turn();
    await fixture.whenStable();
    expect(placeholder()!.textContent!.trim()).toBe('B');
  });

  it('falls back to the placeholder when the stored bytes cannot be drawn', async () => {
    const blob = new Blob(['not a picture'], { type: 'image/webp' });
    const id = await sha256Hex(blob);
    await db().covers.add({ id, blob, mediaType: 'image/webp', state: 'pending' });
    show({ coverId: id, title: 'Stoner' });

    await until(placeholder, 'the placeholder after a failed image');
    expect(placeholder()!.textContent!.trim()).toBe('S');
  });

  it('has no text alternative of its own when the title is beside it', async () => {
    show({ coverId: await storedCover(), title: 'Emma', decorative: true });
    await until(image, 'the image');
    expect(image()!.getAttribute('alt')).toBe('');
  });

  it('revokes its object URL when it leaves the page', async () => {
    show({ coverId: await storedCover(), title: 'Dune' });
    await until(image, 'the image');
    const url = image()!.src;
    const revoke = spyOn(URL, 'revokeObjectURL').and.callThrough();

    fixture.destroy();
    expect(revoke).toHaveBeenCalledWith(url);
  });
});
