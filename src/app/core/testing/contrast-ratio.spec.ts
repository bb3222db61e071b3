import { hex } from 'wcag-contrast';

import { contrastRatio } from './contrast-ratio';

describe('contrastRatio (the WCAG 2.2 formula)', () => {
  it('agrees with the wcag-contrast library (a reference implementation) and the known extremes', () => {
    expect(contrastRatio('#000000', '#ffffff')).toBeCloseTo(21, 10);
    expect(contrastRatio('#777777', '#ffffff')).toBeCloseTo(hex('#777777', '#ffffff'), 10);
    expect(contrastRatio('#777777', '#ffffff')).toBeLessThan(4.5); // the classic grey that just fails
    expect(contrastRatio('#2f5d3a', '#f6f8f2')).toBeCloseTo(hex('#2f5d3a', '#f6f8f2'), 10);
  });
});
