import { Component, signal } from '@angular/core';
import { TestBed } from '@angular/core/testing';

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
