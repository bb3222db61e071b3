// After `ng build`, before precompress: lets the browser fetch every file of the first screen at
// once. The CLI writes `modulepreload` for at most 10 of main's static imports (MODULE_PRELOAD_MAX
// in @angular/build); the rest, Angular core among them, were found only once a chunk importing
// them had been parsed: one round trip more before anything renders. The text faces every page
// uses are preloaded too, instead of being found when the first heading renders. So is the sign-in
// page's chunk with its static imports: `main.ts` asks for it, but its 16 imports were found only
// once it had arrived and been parsed, two round trips after main (and, under Lighthouse's simulated
// throttling, after main's evaluation ×4). A signed-in start fetches them too; from the worker's
// cache, and about half are the shell's own. Then the
// service worker's manifest gets the new page's hash, or the worker would refuse the page.
// Usage: node scripts/preload-initial.mjs [dir]   (default dist/app/browser)
import { createHash } from 'node:crypto';
import { existsSync, readdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import path from 'node:path';

import { root } from './lib.mjs';

const dir = path.resolve(root, process.argv[2] ?? 'dist/app/browser');
/** The faces of the first screen: body text and headings (latin; other scripts load when used). */
const FIRST_FACES = /^atkinson-hyperlegible-latin-(400|700)-normal-[A-Z0-9]+\.woff2$/;
/** The selector of the page a first visit shows (features/account/sign-in), to find its chunk. */
const FIRST_PAGE_SELECTOR = /selectors:\[\[["`]ll-sign-in["`]\]\]/;

const indexPath = path.join(dir, 'index.html');
let html = readFileSync(indexPath, 'utf8');
const entry = html.match(/<script src="(main-[\w-]+\.js)" type="module">/)?.[1];
if (!entry) throw new Error(`preload-initial: no main-*.js script in ${indexPath}`);

/** Every chunk `file` imports statically, however deep (not `import()`: those load on demand). */
function staticImports(file, seen = new Set()) {
  for (const [, chunk] of readFileSync(path.join(dir, file), 'utf8').matchAll(/(?:from|import)\s*"\.\/(chunk-[\w-]+\.js)"/g)) {
    if (!seen.has(chunk)) staticImports(chunk, seen.add(chunk));
  }
  return seen;
}

const firstPage = readdirSync(dir).filter((name) => /^chunk-[\w-]+\.js$/.test(name) && FIRST_PAGE_SELECTOR.test(readFileSync(path.join(dir, name), 'utf8')));
if (firstPage.length !== 1) throw new Error(`preload-initial: ${firstPage.length} chunks hold ${FIRST_PAGE_SELECTOR}, expected one`);
const wanted = new Set([...staticImports(entry), firstPage[0], ...staticImports(firstPage[0])]);
const faces = existsSync(path.join(dir, 'media')) ? readdirSync(path.join(dir, 'media')).filter((name) => FIRST_FACES.test(name)) : [];
// Largest first, main before all: on HTTP/1.1's six connections a big file asked for last ends last.
const bySize = [...wanted].sort((a, b) => statSync(path.join(dir, b)).size - statSync(path.join(dir, a)).size);
const links = [
  `<link rel="modulepreload" href="${entry}">`,
  ...faces.map((face) => `<link rel="preload" href="media/${face}" as="font" type="font/woff2" crossorigin>`),
  ...bySize.map((chunk) => `<link rel="modulepreload" href="${chunk}">`),
];
// The CLI's own modulepreloads (and this script's, when run again) are replaced by the list above.
html = html.replace(/<link rel="(?:modulepreload|preload)" href="(?:chunk-|main-|media\/atkinson-)[^"]*"[^>]*>/g, '');
html = html.replace(`<script src="${entry}"`, `${links.join('')}<script src="${entry}"`);
writeFileSync(indexPath, html);
const manifestPath = path.join(dir, 'ngsw.json');
if (existsSync(manifestPath)) {
  const manifest = JSON.parse(readFileSync(manifestPath, 'utf8'));
  manifest.hashTable['/index.html'] = createHash('sha1').update(html).digest('hex');
  writeFileSync(manifestPath, `${JSON.stringify(manifest, null, 2)}\n`);
}
console.log(`preload-initial: main, ${bySize.length} chunks and ${faces.length} faces preloaded in ${path.relative(root, indexPath)}`);
