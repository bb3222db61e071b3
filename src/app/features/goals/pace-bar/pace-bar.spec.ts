import { TestBed } from '@angular/core/testing';

import { PaceBar, paceBarGeometry } from './pace-bar';

describe('paceBarGeometry', () => {
  it('fills to the share of the target read and puts the marker at the even pace, both within the bar', () => {
    // Hand-worked: 52 books at the start of 1 July 2026 → even pace 52 × 181 / 365 = 25.79 (goalPacing's rule).
    const { done, marker } = paceBarGeometry(29, (52 * 181) / 365, 52);

    expect(done).toBeCloseTo(55.77, 2);
    expect(marker).toBeCloseTo(49.59, 2);
    expect(paceBarGeometry(70, 60, 52)).toEqual({ done: 100, marker: 100 });
  });
});

describe('PaceBar', () => {
  it('is one picture with a text alternative naming where the reader is and where an even pace would be', async () => {
    const fixture = TestBed.createComponent(PaceBar);
    fixture.componentRef.setInput('actual', 3);
    fixture.componentRef.setInput('expectedByToday', 5.95);
    fixture.componentRef.setInput('target', 12);
    fixture.componentRef.setInput('unit', 'books');
    await fixture.whenStable();
    const element = fixture.nativeElement as HTMLElement;
    const bar = element.querySelector('[role="img"]')!;

    expect(bar.getAttribute('aria-label')).toBe('3 of 12 books read; an even pace would be at 6 today.');
    expect(element.querySelector<HTMLElement>('.done')!.style.width).toBe('25%');
    expect(parseFloat(element.querySelector<HTMLElement>('.marker')!.style.left)).toBeCloseTo(49.58, 1);
  });
});
