// Remakes the app icons (PNG) from our one SVG, src/public/icons/lamplight.svg, by rendering it in
// Debian's Chromium. Run after editing the SVG: `node scripts/make-icons.mjs`.
//   any:       192 and 512 px with rounded corners (transparent outside)
//   maskable:  512 px full bleed; the mark stays inside the safe zone, a centred circle of radius
//              40 % of the width (W3C "Web App Manifest" maskable icons)
//   apple:     180 px full bleed (iOS rounds the corners itself)
import { readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';

import { chromium } from 'playwright-core';

import { root } from './lib.mjs';

const icons = path.join(root, 'src/public/icons');
const svg = readFileSync(path.join(icons, 'lamplight.svg'), 'utf8');
const rounded = svg.replace('rx="0"', 'rx="112"');

const targets = [
  { file: 'icon-192.png', size: 192, source: rounded },
  { file: 'icon-512.png', size: 512, source: rounded },
  { file: 'icon-maskable-512.png', size: 512, source: svg },
  { file: 'apple-touch-icon.png', size: 180, source: svg },
];

const browser = await chromium.launch({
  executablePath: process.env.CHROME_BIN ?? '/usr/bin/chromium',
  args: ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
});
try {
  for (const { file, size, source } of targets) {
    const page = await browser.newPage({ viewport: { width: size, height: size }, deviceScaleFactor: 1 });
    const dataUrl = `data:image/svg+xml;base64,${Buffer.from(source).toString('base64')}`;
    await page.setContent(`<html><body style="margin:0;background:transparent"><img src="${dataUrl}" width="${size}" height="${size}"></body></html>`);
    await page.locator('img').evaluate((img) => img.decode());
    writeFileSync(path.join(icons, file), await page.screenshot({ omitBackground: true, clip: { x: 0, y: 0, width: size, height: size } }));
    await page.close();
    console.log(`wrote src/public/icons/${file} (${size}×${size})`);
  }
} finally {
  await browser.close();
}
