import { Component, signal } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { StarRating, starKinds } from './star-rating';

@Component({
  imports: [StarRating],
  template: `<ll-star-rating [rating]="rating()" [size]="size()" />`,
})
class Host {
  readonly rating = signal<number | null>(3.5);
  readonly size = signal(18);
}

/** What a reader sees of one star: painted area and outline, read from the browser's own styles. */
function shapeOf(svg: SVGSVGElement): string {
  const fill = svg.querySelector<SVGPathElement>('path.fill');
  if (!fill) return 'outline only';
  const clip = getComputedStyle(fill).clipPath;
  return clip === 'none' ? 'solid' : `solid, clipped ${clip}`;
}

describe('StarRating', () => {
  it('turns a half-step rating into full, half and empty stars', () => {
    expect(starKinds(3.5)).toEqual(['full', 'full', 'full', 'half', 'empty']);
    expect(starKinds(5)).toEqual(['full', 'full', 'full', 'full', 'full']);
    expect(starKinds(0.5)).toEqual(['half', 'empty', 'empty', 'empty', 'empty']);
    expect(starKinds(null)).toEqual(['empty', 'empty', 'empty', 'empty', 'empty']);
  });

  // WCAG 2.2 SC 1.4.1 Use of Color: colour must not be the only visual means of conveying
  // information, so each kind of star must have its own shape, at every size it is drawn.
  for (const size of [12, 18, 24, 40]) {
    it(`draws full, half and empty stars as three different shapes at ${size} px`, () => {
      const fixture = TestBed.createComponent(Host);
      fixture.componentInstance.size.set(size);
      fixture.detectChanges();
      const root: HTMLElement = fixture.nativeElement;
      const svgs = Array.from(root.querySelectorAll<SVGSVGElement>('svg[data-star]'));
      expect(svgs.map((svg) => svg.dataset['star'])).toEqual(['full', 'full', 'full', 'half', 'empty']);
      const shapes = svgs.map(shapeOf);
      expect(shapes[0]).toBe('solid');
      expect(shapes[3]).toMatch(/^solid, clipped inset\(0(px)? 50%/);
      expect(shapes[4]).toBe('outline only');
      expect(new Set(shapes).size).toBe(3);
      for (const svg of svgs) {
        expect(svg.getBoundingClientRect().width).toBe(size);
        const outline = svg.querySelector<SVGPathElement>('path.outline')!;
        expect(getComputedStyle(outline).fill).toBe('none');
      }
      expect(root.querySelector('[role="img"]')?.getAttribute('aria-label')).toBe('3.5 of 5 stars');
    });
  }

  it('shows the empty text when there is no rating', () => {
    const fixture = TestBed.createComponent(Host);
    fixture.componentInstance.rating.set(null);
    fixture.detectChanges();
    expect(fixture.nativeElement.querySelector('svg')).toBeNull();
    expect(fixture.nativeElement.textContent.trim()).toBe('—');
  });
});
