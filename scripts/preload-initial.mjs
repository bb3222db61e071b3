// After `ng build`, before precompress: lets the browser fetch every file of the first screen at
// once. The CLI writes `modulepreload` for at most 10 of main's static imports (MODULE_PRELOAD_MAX
// in @angular/build); the rest, Angular core among them, were found only once a chunk importing
// them had been parsed: one round trip more before anything renders. The text faces every page
// uses are preloaded too, instead of being found when the first heading renders. So is the sign-in
// page's chunk with its static imports: `main.ts` asks for it, but its 16 imports were found only
// once it had arrived and been parsed, two round trips after main (and, under Lighthouse's simulated
// throttling, after main's evaluation ×4). Those are asked for by a small module script of their
// own (`sign-in-preloads-<hash>.js`, beside main, `async`) and only when no reader is signed in on
// this device: a signed-in start has no use for them (about 30 KB gzip). Then the
// service worker's manifest gets the new page's hash, or the worker would refuse the page.
// Usage: node scripts/preload-initial.mjs [dir]   (default dist/app/browser)
import { createHash } from 'node:crypto';
import { existsSync, readdirSync, readFileSync, statSync, unlinkSync, writeFileSync } from 'node:fs';
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
const everyStart = staticImports(entry);
const signedOutOnly = [firstPage[0], ...staticImports(firstPage[0])].filter((chunk) => !everyStart.has(chunk));
const faces = existsSync(path.join(dir, 'media')) ? readdirSync(path.join(dir, 'media')).filter((name) => FIRST_FACES.test(name)) : [];
// Largest first, main before all: on HTTP/1.1's six connections a big file asked for last ends last.
const bySize = (chunks) => [...chunks].sort((a, b) => statSync(path.join(dir, b)).size - statSync(path.join(dir, a)).size);

// The sign-in closure's preloads, added by a script when nobody is signed in (SESSION_STORAGE_KEY
// in core/auth/stored-session.ts); storage that cannot be read counts as signed out.
const script = `// Written by scripts/preload-initial.mjs: the sign-in page's chunks, preloaded only when signed out.
let signedIn = false;
try { signedIn = localStorage.getItem('lamplight.session') !== null; } catch {}
if (!signedIn) for (const href of ${JSON.stringify(bySize(signedOutOnly))}) {
  const link = document.createElement('link');
  link.rel = 'modulepreload';
  link.href = href;
  document.head.append(link);
}
`;
for (const old of readdirSync(dir).filter((name) => /^sign-in-preloads-[\w-]{8}\.js$/.test(name))) unlinkSync(path.join(dir, old));
const scriptName = `sign-in-preloads-${createHash('sha1').update(script).digest('base64url').slice(0, 8)}.js`;
writeFileSync(path.join(dir, scriptName), script);

const links = [
  `<link rel="modulepreload" href="${entry}">`,
  `<script src="${scriptName}" type="module" async></script>`,
  ...faces.map((face) => `<link rel="preload" href="media/${face}" as="font" type="font/woff2" crossorigin>`),
  ...bySize(everyStart).map((chunk) => `<link rel="modulepreload" href="${chunk}">`),
];
// The CLI's own modulepreloads (and this script's, when run again) are replaced by the list above.
html = html.replace(/<link rel="(?:modulepreload|preload)" href="(?:chunk-|main-|media\/atkinson-)[^"]*"[^>]*>/g, '');
html = html.replace(/<script src="sign-in-preloads-[\w-]{8}\.js" type="module" async><\/script>/g, '');
html = html.replace(`<script src="${entry}"`, `${links.join('')}<script src="${entry}"`);
writeFileSync(indexPath, html);
const manifestPath = path.join(dir, 'ngsw.json');
if (existsSync(manifestPath)) {
  const manifest = JSON.parse(readFileSync(manifestPath, 'utf8'));
  manifest.hashTable['/index.html'] = createHash('sha1').update(html).digest('hex');
  // The worker serves the script offline like the other app files (the app shell group).
  for (const url of Object.keys(manifest.hashTable).filter((url) => /^\/sign-in-preloads-/.test(url))) delete manifest.hashTable[url];
  manifest.hashTable[`/${scriptName}`] = createHash('sha1').update(script).digest('hex');
  const shell = manifest.assetGroups.find((group) => group.urls.includes('/index.html'));
  shell.urls = [...shell.urls.filter((url) => !/^\/sign-in-preloads-/.test(url)), `/${scriptName}`];
  writeFileSync(manifestPath, `${JSON.stringify(manifest, null, 2)}\n`);
}
console.log(
  `preload-initial: main, ${everyStart.size} chunks and ${faces.length} faces preloaded in ${path.relative(root, indexPath)}; ` +
    `${signedOutOnly.length} more when signed out (${scriptName})`,
);
