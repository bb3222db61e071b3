import { Component, signal } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { FormControl, FormGroup } from '@angular/forms';

import { UNLOAD_EVENTS, UnsavedWork } from './unsaved-work';

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

describe('UnsavedWork and closing the tab', () => {
  const page = new EventTarget();
  beforeEach(() => TestBed.configureTestingModule({ providers: [{ provide: UNLOAD_EVENTS, useValue: page }] }));

  /** What the browser sends before it unloads the page; cancelled means it asks the reader. */
  function unloadIsStopped(): boolean {
    const event = new Event('beforeunload', { cancelable: true });
    page.dispatchEvent(event);
    return event.defaultPrevented;
  }

  it('has the browser ask only while something is unsaved', () => {
    const draft = TestBed.createComponent(Draft);
    TestBed.tick();
    expect(unloadIsStopped()).toBeFalse();

    draft.componentInstance.dirty.set(true);
    TestBed.tick();
    expect(unloadIsStopped()).toBeTrue();

    draft.componentInstance.dirty.set(false);
    TestBed.tick();
    expect(unloadIsStopped()).toBeFalse();

    draft.componentInstance.dirty.set(true);
    TestBed.tick();
    draft.destroy();
    TestBed.tick();
    expect(unloadIsStopped()).toBeFalse();
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
