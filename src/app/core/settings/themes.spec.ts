import { hex } from 'wcag-contrast';

import { OUTLINE_PAIRS, TEXT_PAIRS, THEME_PALETTES } from './themes';

/**
 * Contrast as WCAG 2.2 defines it: (L1 + 0.05) / (L2 + 0.05), with L the relative luminance
 * 0.2126 R + 0.7152 G + 0.0722 B of linearised sRGB (WCAG 2.2, definition of "relative
 * luminance"; SC 1.4.3 Contrast (Minimum) asks 4.5:1 for text, SC 1.4.11 3:1 for components).
 */
function contrast(foreground: string, background: string): number {
  const luminance = (colour: string) => {
    const [r, g, b] = [1, 3, 5].map((at) => parseInt(colour.slice(at, at + 2), 16) / 255).map((c) => (c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4));
    return 0.2126 * r! + 0.7152 * g! + 0.0722 * b!;
  };
  const [light, dark] = [luminance(foreground), luminance(background)].sort((a, b) => b - a);
  return (light! + 0.05) / (dark! + 0.05);
}

describe('contrast (the WCAG 2.2 formula)', () => {
  it('agrees with the wcag-contrast library (a reference implementation) and the known extremes', () => {
    expect(contrast('#000000', '#ffffff')).toBeCloseTo(21, 10);
    expect(contrast('#777777', '#ffffff')).toBeCloseTo(hex('#777777', '#ffffff'), 10);
    expect(contrast('#777777', '#ffffff')).toBeLessThan(4.5); // the classic grey that just fails
    expect(contrast('#2f5d3a', '#f6f8f2')).toBeCloseTo(hex('#2f5d3a', '#f6f8f2'), 10);
  });
});

describe('Lamplight’s own themes', () => {
  it('are three, each with its own name and every colour role written as #rrggbb', () => {
    expect(THEME_PALETTES.map((theme) => theme.id)).toEqual(['lamplight', 'moss', 'harbour']);
    for (const theme of THEME_PALETTES) {
      for (const [role, colour] of Object.entries(theme.colours))
        expect(colour)
          .withContext(`${theme.id} ${role}`)
          .toMatch(/^#[0-9a-f]{6}$/);
    }
  });

  for (const theme of THEME_PALETTES) {
    it(`keep text at 4.5:1 or more and outlines at 3:1 or more: ${theme.name}`, () => {
      for (const [text, background] of TEXT_PAIRS) {
        const ratio = hex(theme.colours[text], theme.colours[background]);
        expect(ratio)
          .withContext(`${text} on ${background}: ${ratio.toFixed(2)}`)
          .toBeGreaterThanOrEqual(4.5);
        expect(contrast(theme.colours[text], theme.colours[background])).toBeCloseTo(ratio, 10);
      }
      for (const [outline, background] of OUTLINE_PAIRS) {
        expect(hex(theme.colours[outline], theme.colours[background])).withContext(`${outline} on ${background}`).toBeGreaterThanOrEqual(3);
      }
    });
  }
});
