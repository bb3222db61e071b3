// After `ng build`: writes a .gz and a .br beside every compressible file of the built app, so
// the server sends them as they are (express-static-gzip) instead of compressing per request.
// Node built-ins only (zlib). Usage: node scripts/precompress.mjs [dir]   (default dist/app/browser)
import { readdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { brotliCompressSync, constants, gzipSync } from 'node:zlib';

import { root } from './lib.mjs';

const dir = path.resolve(root, process.argv[2] ?? 'dist/app/browser');
// Fonts in woff2/woff and images are compressed already.
const COMPRESSIBLE = /\.(js|mjs|css|html|json|webmanifest|svg|txt|ttf)$/;
const MIN_BYTES = 1024;

function* files(folder) {
  for (const entry of readdirSync(folder, { withFileTypes: true })) {
    const full = path.join(folder, entry.name);
    if (entry.isDirectory()) yield* files(full);
    else if (COMPRESSIBLE.test(entry.name) && statSync(full).size >= MIN_BYTES) yield full;
  }
}

let count = 0;
let plain = 0;
let brotli = 0;
for (const file of files(dir)) {
  const bytes = readFileSync(file);
  const br = brotliCompressSync(bytes, { params: { [constants.BROTLI_PARAM_QUALITY]: 11, [constants.BROTLI_PARAM_SIZE_HINT]: bytes.length } });
  writeFileSync(`${file}.gz`, gzipSync(bytes, { level: 9 }));
  writeFileSync(`${file}.br`, br);
  count++;
  plain += bytes.length;
  brotli += br.length;
}
console.log(`precompress: ${count} files in ${path.relative(root, dir)}, ${(plain / 1024).toFixed(0)} KiB → ${(brotli / 1024).toFixed(0)} KiB brotli`);
