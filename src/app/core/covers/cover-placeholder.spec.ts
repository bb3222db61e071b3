import { contrastRatio as contrast } from '../testing/contrast-ratio';
import { fnv1a32, PLACEHOLDER_COLOURS, PLACEHOLDER_INK, placeholderColour, titleInitials } from './cover-placeholder';

describe('cover placeholder', () => {
  it('takes the first letters of the first two words', () => {
    expect(titleInitials('The Glass Orchard')).toBe('TG');
    expect(titleInitials('  small rain ')).toBe('SR');
    expect(titleInitials('Ulysses')).toBe('U');
    expect(titleInitials('“Émile”, or On Education')).toBe('ÉO');
    expect(titleInitials('')).toBe('');
    expect(titleInitials(null)).toBe('');
  });

  it('gives a title the same colour every time, whatever its spacing or case', () => {
    expect(placeholderColour('Small Rain')).toBe(placeholderColour(' small rain '));
    expect(PLACEHOLDER_COLOURS).toContain(placeholderColour('Small Rain') as (typeof PLACEHOLDER_COLOURS)[number]);
    const spread = new Set(['Ulysses', 'Middlemarch', 'Beloved', 'Dune', 'Emma', 'Kindred', 'Possession', 'Stoner'].map(placeholderColour));
    expect(spread.size).toBeGreaterThan(3);
  });

  it('hashes with 32-bit FNV-1a (test vectors of the FNV reference code by Fowler, Noll and Vo)', () => {
    expect(fnv1a32('')).toBe(0x811c9dc5);
    expect(fnv1a32('a')).toBe(0xe40c292c);
    expect(fnv1a32('foobar')).toBe(0xbf9cf968);
  });

  it('keeps the initials readable on every colour: at least 4.5:1, WCAG 2.2 success criterion 1.4.3', () => {
    for (const colour of PLACEHOLDER_COLOURS) expect(contrast(PLACEHOLDER_INK, colour)).withContext(colour).toBeGreaterThanOrEqual(4.5);
  });
});
