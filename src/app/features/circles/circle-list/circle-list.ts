import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { FormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { RouterLink } from '@angular/router';

import type { Circle } from '@shared/circles/circle-collections';

import { liveQuerySignal } from '../../../core/data/live-query';
import { fieldError, notBlank } from '../../../ui/field-errors';
import { TextField } from '../../../ui/text-field/text-field';
import { CirclesApi } from '../data/circles-api';
import { CircleEntry } from '../data/circle-entry';
import { CircleSync } from '../data/circle-sync';

/** The reader's circles (from this device), and starting or joining one (online). */
@Component({
  selector: 'll-circle-list',
  imports: [ReactiveFormsModule, RouterLink, MatButtonModule, MatFormFieldModule, MatInputModule, TextField],
  templateUrl: './circle-list.html',
  styleUrl: './circle-list.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CircleList {
  private readonly api = inject(CirclesApi);
  protected readonly sync = inject(CircleSync);
  protected readonly fieldError = fieldError;

  private readonly data = liveQuerySignal(
    async (db) => {
      const metas = await db.circleMeta.toArray();
      const rows = (await db.table('circles').bulkGet(metas.map((meta) => meta.circleId))) as (Circle | undefined)[];
      return metas.map((meta, index) => ({ id: meta.circleId, name: rows[index]?.name ?? 'A circle', role: meta.role, members: meta.members?.length ?? 0 }));
    },
    [] as { id: string; name: string; role?: string; members: number }[],
  );
  protected readonly circles = computed(() => [...this.data()].sort((a, b) => a.name.localeCompare(b.name)));
  protected readonly entry = new CircleEntry();

  protected readonly createForm = inject(FormBuilder).nonNullable.group({
    name: ['', [notBlank, Validators.maxLength(120)]],
    description: ['', Validators.maxLength(1000)],
  });
  protected readonly joinForm = inject(FormBuilder).nonNullable.group({ code: ['', [notBlank, Validators.maxLength(40)]] });

  constructor() {
    void this.sync.syncAll();
  }

  protected create(): Promise<void> {
    if (this.createForm.invalid) return Promise.resolve(this.createForm.markAllAsTouched());
    const { name, description } = this.createForm.getRawValue();
    return this.entry.enter(() => this.api.create(name.trim(), description.trim() || null));
  }

  protected join(): Promise<void> {
    if (this.joinForm.invalid) return Promise.resolve(this.joinForm.markAllAsTouched());
    return this.entry.enter(() => this.api.joinByCode(this.joinForm.getRawValue().code));
  }
}
