import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';

import * as fontkit from 'fontkit';

import { LABEL_ICONS } from '../../shared/sync/schema/collections';

const ROOT = path.resolve(__dirname, '../../../..');
const NAMES: string[] = JSON.parse(readFileSync(path.join(ROOT, 'src/icon-font/icon-names.json'), 'utf8'));
const FONT = path.join(ROOT, 'src/icon-font/lamplight-icons.woff2');

function* sources(folder: string): Generator<string> {
  for (const entry of readdirSync(folder, { withFileTypes: true })) {
    const full = path.join(folder, entry.name);
    if (entry.isDirectory()) yield* sources(full);
    else if (/\.(ts|html)$/.test(entry.name) && !entry.name.endsWith('.spec.ts') && !full.includes(`${path.sep}testing${path.sep}`)) yield full;
  }
}

/**
 * Icon names the app can show: `<mat-icon>name</mat-icon>` (a bare name, or the results of a
 * `cond ? 'a' : 'b'` expression), `fontIcon="name"`, `icon: 'name'` in code, and the label icons a
 * reader picks from (the shared schema's list).
 */
function usedIconNames(): Set<string> {
  const names = new Set<string>(LABEL_ICONS);
  for (const file of sources(path.join(ROOT, 'src/app'))) {
    const text = readFileSync(file, 'utf8');
    for (const [, content] of text.matchAll(/<mat-icon\b[^>]*>([\s\S]*?)<\/mat-icon>/g)) {
      const inside = content.trim();
      if (/^[a-z0-9_]+$/.test(inside)) names.add(inside);
      else for (const [, name] of inside.matchAll(/[?:]\s*'([a-z0-9_]+)'/g)) names.add(name);
    }
    for (const [, name] of text.matchAll(/fontIcon="([a-z0-9_]+)"/g)) names.add(name);
    for (const [, name] of text.matchAll(/\bicon\s*:\s*'([a-z0-9_]+)'/g)) names.add(name);
  }
  return names;
}

describe('The subset icon font (scripts/subset-icons.mjs)', () => {
  it('lists exactly the icon names the app uses in src/icon-font/icon-names.json', () => {
    // A name missing here would render as its letters; an extra one costs bytes for nothing.
    expect([...NAMES].sort()).toEqual([...usedIconNames()].sort());
    expect(NAMES.length).toBeGreaterThan(50);
  });

  it('still turns every listed name into one glyph (fontkit’s GSUB ligatures, not HarfBuzz’s)', () => {
    // fontkit is an independent OpenType engine: layout applies the font's `liga` feature as a
    // browser does, so each name must come out as one ligature glyph that is not .notdef (id 0).
    const font = fontkit.create(readFileSync(FONT)) as fontkit.Font;
    for (const name of NAMES) {
      const glyphs = font.layout(name, ['liga']).glyphs;
      expect(glyphs.map((glyph) => glyph.id))
        .withContext(name)
        .toEqual([jasmine.any(Number)]);
      expect(glyphs[0]?.id).withContext(name).not.toBe(0);
      expect(glyphs[0]?.path.commands.length).withContext(`${name} has an outline`).toBeGreaterThan(0);
    }
  });

  it('drops every other ligature of the whole font', () => {
    const font = fontkit.create(readFileSync(FONT)) as fontkit.Font;
    const whole = fontkit.create(
      readFileSync(require.resolve('@fontsource/material-symbols-outlined/files/material-symbols-outlined-latin-400-normal.woff2')),
    ) as fontkit.Font;
    // Names the app does not use: one glyph in the whole font, letters in ours.
    for (const name of ['home', 'pets', 'shopping_cart']) {
      expect(NAMES).not.toContain(name);
      expect(whole.layout(name, ['liga']).glyphs.length)
        .withContext(name)
        .toBe(1);
      expect(font.layout(name, ['liga']).glyphs.length)
        .withContext(name)
        .toBe(name.length);
    }
    expect(font.numGlyphs).toBeLessThan(NAMES.length + 64);
  });
});
