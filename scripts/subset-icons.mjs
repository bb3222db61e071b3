// Before `ng build`: cuts the icon font down to the icons Lamplight names in src/icon-font/icon-names.json
// (the list spec/integration/icon-font.spec.ts keeps in step with the templates and code).
// The font is a ligature font: the text "home" becomes one "home" glyph through GSUB. Subsetting by
// text would keep every ligature made of the letters a–z, i.e. the whole font, so we subset by glyph:
// HarfBuzz shapes each name to find its ligature glyph, then hb-subset keeps exactly those glyphs
// (plus the letters' cmap entries) with layout closure off, which prunes every other ligature.
// Writes src/icon-font/lamplight-icons.woff2 (committed, so a bare `ng build` works too).
// Usage: node scripts/subset-icons.mjs
import { readFileSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import path from 'node:path';

import * as hb from 'harfbuzzjs';

import { root } from './lib.mjs';

const require = createRequire(import.meta.url);
// wawoff2 is CommonJS: woff2 ⇄ sfnt with Google's woff2 library (brotli).
const woff2 = require('wawoff2');

const SOURCE = require.resolve('@fontsource/material-symbols-outlined/files/material-symbols-outlined-latin-400-normal.woff2');
const NAMES = path.join(root, 'src/icon-font/icon-names.json');
const OUTPUT = path.join(root, 'src/icon-font/lamplight-icons.woff2');
// hb-subset.h: HB_SUBSET_FLAGS_NO_HINTING | HB_SUBSET_FLAGS_NO_LAYOUT_CLOSURE.
const NO_HINTING = 0x1;
const NO_LAYOUT_CLOSURE = 0x200;

/** The one glyph each name shapes to with the font's ligatures, or a reason it does not. */
function ligatureGlyphs(sfnt, names) {
  const face = new hb.Face(new hb.Blob(sfnt));
  const font = new hb.Font(face);
  const glyphs = new Map();
  for (const name of names) {
    const buffer = new hb.Buffer();
    buffer.addText(name);
    buffer.guessSegmentProperties();
    hb.shape(font, buffer);
    const infos = buffer.getGlyphInfos();
    if (infos.length !== 1 || infos[0].codepoint === 0) throw new Error(`icon "${name}" is not one ligature in the icon font (${infos.length} glyphs)`);
    glyphs.set(name, infos[0].codepoint);
  }
  return glyphs;
}

/** hb-subset (HarfBuzz's own wasm build in harfbuzzjs) on an explicit glyph set. */
async function subset(sfnt, codepoints, glyphIds) {
  const wasm = readFileSync(require.resolve('harfbuzzjs/dist/harfbuzz-subset.wasm'));
  const { instance } = await globalThis.WebAssembly.instantiate(wasm);
  const x = instance.exports;
  const input = x.hb_subset_input_create_or_fail();
  const fontPointer = x.malloc(sfnt.byteLength);
  new Uint8Array(x.memory.buffer).set(sfnt, fontPointer);
  const blob = x.hb_blob_create(fontPointer, sfnt.byteLength, 2 /* HB_MEMORY_MODE_WRITABLE */, 0, 0);
  const face = x.hb_face_create(blob, 0);
  x.hb_blob_destroy(blob);
  const unicodes = x.hb_subset_input_unicode_set(input);
  for (const codepoint of codepoints) x.hb_set_add(unicodes, codepoint);
  const glyphs = x.hb_subset_input_glyph_set(input);
  for (const id of glyphIds) x.hb_set_add(glyphs, id);
  x.hb_subset_input_set_flags(input, NO_HINTING | NO_LAYOUT_CLOSURE);
  const result = x.hb_subset_or_fail(face, input);
  x.hb_subset_input_destroy(input);
  if (!result) throw new Error('hb-subset failed on the icon font');
  const resultBlob = x.hb_face_reference_blob(result);
  const offset = x.hb_blob_get_data(resultBlob, 0);
  const bytes = new Uint8Array(x.memory.buffer).slice(offset, offset + x.hb_blob_get_length(resultBlob));
  x.hb_blob_destroy(resultBlob);
  x.free(fontPointer);
  return bytes;
}

const names = JSON.parse(readFileSync(NAMES, 'utf8'));
const whole = await woff2.decompress(readFileSync(SOURCE));
const glyphs = ligatureGlyphs(whole, names);
const letters = new Set(names.flatMap((name) => [...name].map((character) => character.codePointAt(0))));
const cut = await subset(whole, letters, glyphs.values());
// The check the browser will make: every name is still one ligature glyph in the cut font.
ligatureGlyphs(cut, names);
const packed = Buffer.from(await woff2.compress(cut));
let previous = null;
try {
  previous = readFileSync(OUTPUT);
} catch {
  // first run
}
if (!previous?.equals(packed)) writeFileSync(OUTPUT, packed);
const before = readFileSync(SOURCE).length;
console.log(
  `subset-icons: ${names.length} icons, ${(before / 1024).toFixed(0)} KiB → ${(packed.length / 1024).toFixed(1)} KiB woff2 (${path.relative(root, OUTPUT)})`,
);
