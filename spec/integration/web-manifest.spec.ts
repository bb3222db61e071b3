import { readFileSync } from 'node:fs';
import path from 'node:path';

const ROOT = path.resolve(__dirname, '../../../..');
const PUBLIC = path.join(ROOT, 'src/public');

interface ManifestIcon {
  src: string;
  sizes: string;
  type: string;
  purpose?: string;
}

/** Width and height from a PNG's IHDR chunk (PNG specification, W3C/ISO 15948 §11.2.2). */
function pngSize(file: string): { width: number; height: number } {
  const bytes = readFileSync(file);
  // The 8-byte signature 89 50 4E 47 0D 0A 1A 0A, then the IHDR chunk: length, "IHDR", width, height.
  expect(bytes.subarray(0, 8).toString('hex')).toBe('89504e470d0a1a0a');
  expect(bytes.subarray(12, 16).toString('ascii')).toBe('IHDR');
  return { width: bytes.readUInt32BE(16), height: bytes.readUInt32BE(20) };
}

describe('The web app manifest', () => {
  const manifest = JSON.parse(readFileSync(path.join(PUBLIC, 'manifest.webmanifest'), 'utf8')) as Record<string, unknown>;
  const icons = manifest['icons'] as ManifestIcon[];

  it('has the members the W3C Web App Manifest and Chromium’s install criteria ask for', () => {
    // Chromium installability (from memory of web.dev "Install criteria"): name or short_name,
    // icons of 192 and 512 px, start_url, display of standalone/fullscreen/minimal-ui.
    expect(manifest['name']).toBe('Lamplight');
    expect(manifest['short_name']).toBe('Lamplight');
    expect(typeof manifest['description']).toBe('string');
    expect(manifest['start_url']).toBe('/today');
    expect(manifest['scope']).toBe('/');
    expect(manifest['display']).toBe('standalone');
    // start_url must be within scope (W3C Web App Manifest, "within scope").
    expect((manifest['start_url'] as string).startsWith(manifest['scope'] as string)).toBeTrue();
  });

  it('takes its colours from our theme (CSS hex colours)', () => {
    expect(manifest['theme_color']).toBe('#8d4f00'); // primary 40 of src/styles/_theme-colors.scss
    expect(manifest['background_color']).toBe('#fff8f4'); // the light surface
    const theme = readFileSync(path.join(ROOT, 'src/styles/_theme-colors.scss'), 'utf8');
    expect(theme).toContain('40: #8d4f00');
  });

  it('lists PNG icons of 192 and 512 px whose files really are that size, and a maskable one', () => {
    for (const size of [192, 512]) {
      const icon = icons.find((i) => i.sizes === `${size}x${size}` && i.type === 'image/png' && (i.purpose ?? 'any').includes('any'));
      expect(icon).withContext(`${size} px icon`).toBeDefined();
      expect(pngSize(path.join(PUBLIC, icon!.src))).toEqual({ width: size, height: size });
    }
    const maskable = icons.find((i) => i.purpose?.split(' ').includes('maskable'));
    expect(maskable).toBeDefined();
    expect(pngSize(path.join(PUBLIC, maskable!.src))).toEqual({ width: 512, height: 512 });
  });

  it('paints the maskable icon edge to edge, so no transparent corner shows in a mask', () => {
    // W3C "maskable" purpose: the safe zone is a centred circle of radius 40 % of the width; the
    // area outside it may be cropped, so it must be filled, not transparent.
    const bytes = readFileSync(path.join(PUBLIC, 'icons/icon-maskable-512.png'));
    const colourType = bytes[25];
    // 2 = truecolour without alpha, 6 = with alpha (PNG §11.2.2); either way the mark was drawn on a full-bleed rect.
    expect([2, 6]).toContain(colourType!);
    const svg = readFileSync(path.join(PUBLIC, 'icons/lamplight.svg'), 'utf8');
    expect(svg).toMatch(/<rect width="512" height="512" rx="0"/);
  });

  it('is linked from index.html with an Apple touch icon of 180 px', () => {
    const html = readFileSync(path.join(ROOT, 'src/index.html'), 'utf8');
    expect(html).toContain('<link rel="manifest" href="manifest.webmanifest" />');
    expect(html).toContain('<link rel="apple-touch-icon" href="icons/apple-touch-icon.png" />');
    expect(pngSize(path.join(PUBLIC, 'icons/apple-touch-icon.png'))).toEqual({ width: 180, height: 180 });
  });
});

describe('The service worker configuration', () => {
  const config = JSON.parse(readFileSync(path.join(ROOT, 'ngsw-config.json'), 'utf8')) as {
    assetGroups: { name: string; installMode: string; resources: { files: string[] } }[];
    dataGroups?: unknown[];
    navigationUrls: string[];
  };

  it('caches no API answers (data lives in IndexedDB) and never treats /api as a navigation', () => {
    expect(config.dataGroups ?? []).toEqual([]);
    expect(config.assetGroups.flatMap((g) => g.resources.files).some((f) => f.startsWith('/api'))).toBeFalse();
    expect(config.navigationUrls).toContain('!/api/**');
  });

  it('prefetches the app shell, the fonts and the icons', () => {
    const prefetched = config.assetGroups.filter((g) => g.installMode === 'prefetch').flatMap((g) => g.resources.files);
    expect(prefetched).toEqual(jasmine.arrayContaining(['/index.html', '/*.js', '/*.css', '/media/*.woff2', '/icons/**', '/manifest.webmanifest']));
  });
});
