import { ChangeDetectionStrategy, Component, computed, effect, inject, input, signal } from '@angular/core';
import { FormBuilder, ReactiveFormsModule, Validators, type FormGroup } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { MatSlideToggleModule } from '@angular/material/slide-toggle';
import { MatSnackBar } from '@angular/material/snack-bar';
import { Router, RouterLink } from '@angular/router';

import type { CirclePart, CirclePick, RsvpAnswer } from '@shared/circles/circle-collections';
import { formatJoinCode } from '@shared/circles/invitations';
import { deterministicId } from '@shared/sync/deterministic-id';
import { describePartEnd, parsePartEnd, partEndOf, storedPartEnd, type PartEnd } from '@shared/circles/schedule';

import { Auth } from '../../../core/auth/auth';
import { BookCover } from '../../../core/covers/book-cover/book-cover';
import { CoverPicker } from '../../../core/covers/cover-picker/cover-picker';
import { InvalidFieldsError } from '../../../core/data/field-errors';
import { JournalStore } from '../../../core/data/journal-store';
import { liveQueryFor } from '../../../core/data/live-query-for';
import { readableError } from '../../../core/http/api-error-message';
import { fieldError, notBlank, showServerErrors } from '../../../ui/field-errors';
import { TextField } from '../../../ui/text-field/text-field';
import { UNDO_OFFER_MS } from '../../../ui/undoable-delete';
import { CirclesApi } from '../data/circles-api';
import { CircleStore } from '../data/circle-store';
import { CircleSync } from '../data/circle-sync';
import { loadCircleView, type CircleView } from '../data/circle-view';

/** One circle: its picks and schedule, meetings and answers, members, and the host's tools. */
@Component({
  selector: 'll-circle-page',
  imports: [
    BookCover,
    CoverPicker,
    ReactiveFormsModule,
    RouterLink,
    MatButtonModule,
    MatButtonToggleModule,
    MatFormFieldModule,
    MatInputModule,
    MatSelectModule,
    MatSlideToggleModule,
    TextField,
  ],
  templateUrl: './circle-page.html',
  styleUrl: './circle-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CirclePage {
  readonly id = input.required<string>();
  private readonly auth = inject(Auth);
  private readonly store = inject(CircleStore);
  private readonly journal = inject(JournalStore);
  private readonly api = inject(CirclesApi);
  private readonly router = inject(Router);
  private readonly snackBar = inject(MatSnackBar);
  protected readonly sync = inject(CircleSync);
  protected readonly fieldError = fieldError;
  protected readonly describePartEnd = describePartEnd;
  protected readonly partEndOf = partEndOf;

  protected readonly myId = computed(() => this.auth.user()?.id ?? '');
  protected readonly view = liveQueryFor(this.id, (db, id) => loadCircleView(db, id, this.myId()));
  protected readonly isHost = computed(() => this.view()?.meta?.role === 'host');
  protected readonly message = signal<string | null>(null);
  protected readonly joinCode = signal<string | null>(null);
  protected readonly formatJoinCode = formatJoinCode;

  private readonly fb = inject(FormBuilder).nonNullable;
  /** The pick or part whose fields the host's form holds, or null when it adds a new one. */
  protected readonly editingPick = signal<string | null>(null);
  protected readonly editingPart = signal<string | null>(null);
  protected readonly pickForm = this.fb.group({
    title: ['', [notBlank, Validators.maxLength(500)]],
    authors: ['', Validators.maxLength(400)],
    isbn: [''],
    format: ['print' as 'print' | 'ebook' | 'audiobook'],
    pageCount: [null as number | null, [Validators.min(1), Validators.max(100_000)]],
    audioMinutes: [null as number | null, [Validators.min(1), Validators.max(20_000)]],
  });
  protected readonly partForm = this.fb.group({
    pickId: ['', Validators.required],
    label: ['', [notBlank, Validators.maxLength(120)]],
    end: ['', [notBlank, Validators.maxLength(120)]],
    date: [''],
    time: ['', Validators.pattern(/^([01]\d|2[0-3]):[0-5]\d$/)],
    place: ['', Validators.maxLength(300)],
    link: [''],
  });
  protected readonly inviteForm = this.fb.group({ email: ['', [Validators.required, Validators.email]] });

  constructor() {
    queueMicrotask(() => void this.refresh());
    // While sharing is on, what the circle sees follows the reader's own reading (sessions move the shield).
    effect(() => {
      const view = this.view();
      if (!view?.mine?.shareProgress) return;
      const past = pastParts(view);
      if (!sameMembers(past, view.mine.sharedPastPartIds ?? [])) void this.store.write('circleProgress', view.myProgressId, this.id(), { sharedPastPartIds: past });
    });
    // Meeting reminders come the day before in the reader's own day: the server learns their zone (never shown to others).
    effect(() => {
      const view = this.view();
      const timeZone = Intl.DateTimeFormat().resolvedOptions().timeZone;
      if (view && timeZone && view.mine?.timeZone !== timeZone) void this.store.write('circleProgress', view.myProgressId, this.id(), { timeZone });
    });
  }

  protected async refresh(): Promise<void> {
    await this.sync.syncCircle(this.id());
    // Only hosts get a code back; members and offline readers get none.
    this.joinCode.set((await this.api.details(this.id()).catch(() => null))?.joinCode ?? null);
  }

  protected nameOf(view: CircleView, userId: string | undefined): string {
    if (userId === this.myId()) return 'You';
    return view.meta?.members?.find((member) => member.userId === userId)?.displayName ?? 'A former member';
  }

  protected partsOf(view: CircleView, pickId: string) {
    return view.parts.filter((part) => part.pickId === pickId);
  }

  protected myRsvp(view: CircleView, partId: string): RsvpAnswer | null {
    return view.rsvps.find((rsvp) => rsvp.partId === partId && rsvp._author === this.myId())?.answer ?? null;
  }

  protected answers(view: CircleView, partId: string): string {
    const of = (answer: RsvpAnswer) => view.rsvps.filter((rsvp) => rsvp.partId === partId && rsvp.answer === answer).length;
    return `${of('going')} going · ${of('maybe')} maybe · ${of('notGoing')} not going`;
  }

  /** Members sharing their progress who are past this part ("Wren is past part 2"). */
  protected pastBy(view: CircleView, partId: string): string[] {
    return view.shared.filter((row) => row.sharedPastPartIds?.includes(partId)).map((row) => this.nameOf(view, row._author));
  }

  protected rsvp(partId: string, answer: RsvpAnswer): Promise<void> {
    // One answer per reader per meeting, the same row on every device.
    return this.store.write('circleRsvps', deterministicId('circle-rsvp', `${partId}:${this.myId()}`), this.id(), { partId, answer, deleted: false });
  }

  protected async setSharing(view: CircleView, on: boolean): Promise<void> {
    await this.store.write('circleProgress', view.myProgressId, this.id(), { shareProgress: on, sharedPastPartIds: on ? pastParts(view) : null });
  }

  protected async markPast(view: CircleView, partId: string): Promise<void> {
    const pastPartIds = [...new Set([...(view.mine?.pastPartIds ?? []), partId])];
    const shared = view.mine?.shareProgress ? { sharedPastPartIds: [...new Set([...(view.mine.sharedPastPartIds ?? []), partId])] } : {};
    await this.store.write('circleProgress', view.myProgressId, this.id(), { pastPartIds, ...shared });
  }

  /** The pick becomes a book of the reader's own, linked to the pick (the link stays private to them). */
  protected async addToLibrary(view: CircleView, pick: CirclePick): Promise<void> {
    const bookId = await this.journal.create('books', {
      title: pick.title ?? 'Untitled',
      authors: pick.authors ?? [],
      format: pick.format ?? 'print',
      pageCount: pick.pageCount ?? null,
      audioMinutes: pick.audioMinutes ?? null,
      isbn: pick.isbn ?? null,
      status: 'tbr',
      statusChangedAt: new Date().toISOString(),
    });
    await this.store.write('circleProgress', view.myProgressId, this.id(), { bookLinks: { ...(view.mine?.bookLinks ?? {}), [pick.id]: bookId } });
  }

  /** The circle's cover (hosts): uploaded by the device like a book's, seen by members only. */
  protected setCover(coverId: string | null): Promise<void> {
    return this.store.write('circles', this.id(), this.id(), { coverId });
  }

  protected editPick(pick: CirclePick): void {
    this.editingPick.set(pick.id);
    this.pickForm.reset({
      title: pick.title ?? '',
      authors: (pick.authors ?? []).join(', '),
      isbn: pick.isbn ?? '',
      format: pick.format ?? 'print',
      pageCount: pick.pageCount ?? null,
      audioMinutes: pick.audioMinutes ?? null,
    });
    focusForm('pick-form');
  }

  protected cancelPick(): void {
    this.editingPick.set(null);
    this.pickForm.reset({ format: 'print' });
  }

  /** Adds a pick, or saves the one being edited; the shared schema's reasons show under the fields. */
  protected async savePick(): Promise<void> {
    if (this.pickForm.invalid) return this.pickForm.markAllAsTouched();
    const value = this.pickForm.getRawValue();
    const fields = {
      title: value.title.trim(),
      authors: value.authors
        .split(',')
        .map((author) => author.trim())
        .filter(Boolean),
      isbn: value.isbn.replace(/[\s-]/g, '') || null,
      format: value.format,
      pageCount: value.pageCount || null,
      audioMinutes: value.audioMinutes || null,
    };
    const editing = this.editingPick();
    const saved = await this.saving(this.pickForm, PICK_LABELS, () =>
      editing
        ? this.store.write('circlePicks', editing, this.id(), fields)
        : this.store.create('circlePicks', this.id(), { ...fields, addedOn: new Date().toISOString().slice(0, 10) }),
    );
    if (saved) this.cancelPick();
  }

  protected editPart(part: CirclePart): void {
    this.editingPart.set(part.id);
    const end = part.endKind && part.endValue ? partEndOf({ endKind: part.endKind, endValue: part.endValue }) : null;
    this.partForm.reset({
      pickId: part.pickId ?? '',
      label: part.label ?? '',
      end: end ? typedPartEnd(end) : '',
      date: part.date ?? '',
      time: part.time ?? '',
      place: part.place ?? '',
      link: part.link ?? '',
    });
    focusForm('part-form');
  }

  protected cancelPart(): void {
    const pickId = this.partForm.getRawValue().pickId;
    this.editingPart.set(null);
    this.partForm.reset({ pickId });
  }

  protected async removePart(part: CirclePart): Promise<void> {
    // A tombstone, undone from the snack bar like every delete (ui/undoable-delete.ts does the same for the journal).
    const circleId = this.id();
    await this.store.write('circleParts', part.id, circleId, { deleted: true });
    if (this.editingPart() === part.id) this.cancelPart();
    this.snackBar
      .open(`${part.label ?? 'The part'} removed from the schedule.`, 'Undo', { duration: UNDO_OFFER_MS })
      .onAction()
      .subscribe(() => void this.store.write('circleParts', part.id, circleId, { deleted: false }));
  }

  /** Adds a part, or saves the one being edited (where it ends, its date, time, place or link). */
  protected async savePart(view: CircleView): Promise<void> {
    const value = this.partForm.getRawValue();
    const end = parsePartEnd(value.end);
    if (!end) this.partForm.controls.end.setErrors({ end: true });
    if (this.partForm.invalid || !end) return this.partForm.markAllAsTouched();
    const fields = {
      pickId: value.pickId,
      label: value.label.trim(),
      ...storedPartEnd(end),
      date: value.date || null,
      time: value.time || null,
      place: value.place.trim() || null,
      link: value.link.trim() || null,
    };
    const editing = this.editingPart();
    const saved = await this.saving(this.partForm, PART_LABELS, () =>
      editing
        ? this.store.write('circleParts', editing, this.id(), fields)
        : this.store.create('circleParts', this.id(), { ...fields, position: this.partsOf(view, value.pickId).length + 1 }),
    );
    if (saved) this.cancelPart();
  }

  /** Runs a write; a refusal by the shared schema goes under its fields, in words. */
  private async saving(form: FormGroup, labels: Readonly<Record<string, string>>, write: () => Promise<unknown>): Promise<boolean> {
    this.message.set(null);
    try {
      await write();
      return true;
    } catch (error) {
      if (!(error instanceof InvalidFieldsError)) throw error;
      const { endKind, endValue, ...rest } = error.fields;
      const fields = { ...rest, ...(endKind || endValue ? { end: endKind ?? endValue } : {}) };
      showServerErrors(form, Object.fromEntries(Object.entries(fields).map(([field, reason]) => [field, `${labels[field] ?? field} ${reason}`])));
      this.message.set('Some fields need attention; nothing was saved.');
      return false;
    }
  }

  protected async invite(): Promise<void> {
    if (this.inviteForm.invalid) return this.inviteForm.markAllAsTouched();
    await this.online(async () => {
      await this.api.invite(this.id(), this.inviteForm.getRawValue().email.trim());
      this.inviteForm.reset();
      this.message.set('Invitation sent. The link works once, for 7 days.');
    });
  }

  protected rotate(): Promise<void> {
    return this.online(async () => this.joinCode.set((await this.api.rotateJoinCode(this.id())).joinCode));
  }

  protected remove(userId: string): Promise<void> {
    return this.online(async () => void (await this.api.remove(this.id(), userId)));
  }

  protected makeHost(userId: string): Promise<void> {
    return this.online(async () => void (await this.api.handOver(this.id(), userId, true)));
  }

  protected leave(): Promise<void> {
    return this.online(async () => {
      await this.api.leave(this.id());
      await this.sync.syncAll();
      await this.router.navigate(['/circles']);
    });
  }

  private async online(action: () => Promise<void>): Promise<void> {
    this.message.set(null);
    try {
      await action();
      await this.sync.syncCircle(this.id());
    } catch (error) {
      this.message.set(readableError(error).message);
    }
  }
}

const PICK_LABELS: Readonly<Record<string, string>> = { title: 'The title', authors: 'Authors', isbn: 'The ISBN', pageCount: 'Pages', audioMinutes: 'Minutes' };
const PART_LABELS: Readonly<Record<string, string>> = {
  label: 'The name',
  end: 'The end',
  date: 'The date',
  time: 'The time',
  place: 'The place',
  link: 'The link',
};

/** A stored end as a host would type it again: "p. 120", "45%", or the chapter's name. */
function typedPartEnd(end: PartEnd): string {
  return end.kind === 'page' ? `p. ${end.page}` : end.kind === 'percent' ? `${end.percent}%` : end.label;
}

/** Brings the host's form into view with its first field focused (the edit buttons are far above it). */
function focusForm(id: string): void {
  const form = document.getElementById(id);
  form?.scrollIntoView({ block: 'start' });
  form?.querySelector<HTMLElement>('input, mat-select')?.focus();
}

/** Every part the reader is past, over all picks, in a stable order. */
const pastParts = (view: CircleView): string[] => [...view.shield.values()].flatMap((context) => [...context.passed]).sort();
const sameMembers = (a: readonly string[], b: readonly string[]) => a.length === b.length && [...b].sort().every((id, index) => id === a[index]);
