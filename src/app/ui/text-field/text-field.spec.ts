import { Component } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';

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
    const fixture = TestBed.createComponent(Host);
    await fixture.whenStable();
    const element: HTMLElement = fixture.nativeElement;
    const name = element.querySelector<HTMLInputElement>('.name input')!;
    const email = element.querySelector<HTMLInputElement>('.email input')!;
    expect(element.querySelector('.name mat-label')?.textContent?.trim()).toBe('Series name');
    expect(element.querySelector('.name mat-hint')?.textContent?.trim()).toBe('As on the cover');
    expect(element.querySelector('.email mat-hint')).toBeNull();
    expect(name.getAttribute('autocomplete')).toBe('off');
    expect(name.type).toBe('text');
    expect([email.type, email.getAttribute('autocomplete'), email.getAttribute('inputmode')]).toEqual(['email', 'email', 'email']);

    name.value = 'The Lantern Years';
    name.dispatchEvent(new Event('input'));
    expect(fixture.componentInstance.form.controls.name.value).toBe('The Lantern Years');
  });

  it('shows the first error in the reader’s words once its form is submitted', async () => {
    const fixture = TestBed.createComponent(Host);
    await fixture.whenStable();
    const element: HTMLElement = fixture.nativeElement;
    expect(element.querySelector('mat-error')).toBeNull();

    element.querySelector<HTMLButtonElement>('button')!.click();
    await fixture.whenStable();
    expect(element.querySelector('.name mat-error')?.textContent?.trim()).toBe('Name is required');
    expect(element.querySelector('.email mat-error')).toBeNull();
  });
});
