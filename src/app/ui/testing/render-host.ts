import type { Type } from '@angular/core';
import { TestBed, type ComponentFixture } from '@angular/core/testing';

/** A rendered spec host, and what a field spec asks of its page. */
export interface RenderedHost<T> {
  readonly fixture: ComponentFixture<T>;
  readonly element: HTMLElement;
  /** The first element matching `selector` (the spec fails on a null where it expects one). */
  find<E extends Element = HTMLElement>(selector: string): E;
  /** The trimmed text of the first element matching `selector`, or undefined when there is none. */
  text(selector: string): string | undefined;
  /** The trimmed text of each option of the select matching `selector`. */
  optionTexts(selector: string): (string | undefined)[];
}

/** Creates the spec's host component and waits until it is stable. */
export async function renderHost<T>(host: Type<T>): Promise<RenderedHost<T>> {
  const fixture = TestBed.createComponent(host);
  await fixture.whenStable();
  const element: HTMLElement = fixture.nativeElement;
  return {
    fixture,
    element,
    find: <E extends Element>(selector: string) => element.querySelector<E>(selector)!,
    text: (selector) => element.querySelector(selector)?.textContent?.trim(),
    optionTexts: (selector) => [...element.querySelector<HTMLSelectElement>(selector)!.options].map((option) => option.textContent?.trim()),
  };
}
