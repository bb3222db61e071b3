import { Component, signal } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { FormControl, FormGroup } from '@angular/forms';

import { UnsavedWork } from './unsaved-work';

@Component({ selector: 'll-draft', template: '' })
class Draft {
  readonly dirty = signal(false);
  constructor() {
    TestBed.inject(UnsavedWork).track(this.dirty);
  }
}

describe('UnsavedWork', () => {
  it('is present while any tracked owner is dirty, and forgets owners that are gone', () => {
    const unsaved = TestBed.inject(UnsavedWork);
    const first = TestBed.createComponent(Draft);
    const second = TestBed.createComponent(Draft);
    expect(unsaved.present()).toBeFalse();

    second.componentInstance.dirty.set(true);
    expect(unsaved.present()).toBeTrue();

    second.destroy();
    expect(unsaved.present()).toBeFalse();
    first.componentInstance.dirty.set(true);
    expect(unsaved.present()).toBeTrue();
  });
});

describe('UnsavedWork.trackForm', () => {
  @Component({ selector: 'll-form-draft', template: '' })
  class FormDraft {
    readonly form = new FormGroup({ title: new FormControl('') });
    readonly note = new FormControl('');
    constructor() {
      TestBed.inject(UnsavedWork).trackForm(this.form, this.note);
    }
  }

  it('is present while any of the forms is dirty, and not once a save marks them pristine', () => {
    const unsaved = TestBed.inject(UnsavedWork);
    const { form, note } = TestBed.createComponent(FormDraft).componentInstance;
    expect(unsaved.present()).toBeFalse();

    form.controls.title.markAsDirty();
    form.controls.title.setValue('The Salt Road');
    expect(unsaved.present()).toBeTrue();
    note.markAsDirty();
    // A save marks the form pristine without changing its value: valueChanges would not tell.
    form.markAsPristine();
    expect(unsaved.present()).toBeTrue(); // the note is still dirty
    note.markAsPristine();
    expect(unsaved.present()).toBeFalse();
  });
});
