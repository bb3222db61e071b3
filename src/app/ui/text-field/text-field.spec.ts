import { Component } from '@angular/core';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';

import { renderHost } from '../testing/render-host';
import { TextField } from './text-field';

@Component({
  imports: [ReactiveFormsModule, TextField],
  template: `
    <form [formGroup]="form" novalidate>
      <ll-text-field class="name" [control]="form.controls.name" label="Series name" errorName="Name" hint="As on the cover" />
      <ll-text-field class="email" [control]="form.controls.email" label="E-mail" errorName="E-mail" type="email" inputmode="email" autocomplete="email" />
      <button type="submit">Save</button>
    </form>
  `,
})
class Host {
  readonly form = new FormGroup({
    name: new FormControl('', { nonNullable: true, validators: Validators.required }),
    email: new FormControl('', { nonNullable: true, validators: Validators.email }),
  });
}

describe('TextField', () => {
  it('labels its input, writes what is typed to the control and keeps autocomplete off unless asked', async () => {
    const host = await renderHost(Host);
    const name = host.find<HTMLInputElement>('.name input');
    const email = host.find<HTMLInputElement>('.email input');
    expect(host.text('.name mat-label')).toBe('Series name');
    expect(host.text('.name mat-hint')).toBe('As on the cover');
    expect(host.text('.email mat-hint')).toBeUndefined();
    expect(name.getAttribute('autocomplete')).toBe('off');
    expect(name.type).toBe('text');
    expect([email.type, email.getAttribute('autocomplete'), email.getAttribute('inputmode')]).toEqual(['email', 'email', 'email']);

    name.value = 'The Lantern Years';
    name.dispatchEvent(new Event('input'));
    expect(host.fixture.componentInstance.form.controls.name.value).toBe('The Lantern Years');
  });

  it('shows the first error in the reader’s words once its form is submitted', async () => {
    const host = await renderHost(Host);
    expect(host.text('mat-error')).toBeUndefined();

    host.find<HTMLButtonElement>('button').click();
    await host.fixture.whenStable();
    expect(host.text('.name mat-error')).toBe('Name is required');
    expect(host.text('.email mat-error')).toBeUndefined();
  });
});
