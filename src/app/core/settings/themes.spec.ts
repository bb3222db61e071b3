import { hex } from 'wcag-contrast';

import { contrastRatio as contrast } from '../testing/contrast-ratio';
import { OUTLINE_PAIRS, TEXT_PAIRS, THEME_PALETTES } from './themes';

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
