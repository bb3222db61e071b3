/**
 * Light formatting for notebook pages: plain text the reader types, read into a small tree of
 * blocks and inline runs. There are no HTML strings anywhere: the app draws the tree with
 * elements and text nodes, so whatever the text holds (`<script>`, `&amp;`) stays text.
 *
 * Line by line (leading spaces are ignored when looking for a marker):
 *
 * | typed              | becomes                                   |
 * | ------------------ | ----------------------------------------- |
 * | `# Title`          | a heading (level 1)                       |
 * | `## Title`         | a smaller heading (level 2)               |
 * | `- item`           | a list item                               |
 * | `[ ] item`         | a list item to tick off (also `- [ ] item`) |
 * | `[x] item`         | a ticked list item (`[X]` too)            |
 * | `> words`          | a quote; following `>` lines join it      |
 * | a blank line       | ends the paragraph, list or quote         |
 * | anything else      | a paragraph; its line breaks are kept     |
 *
 * Within a line, `*words*` are emphasised and `**words**` are strong; they nest. A marker must
 * touch its words (`5 * 3 * 2` stays as typed) and a marker with no partner stays as typed.
 * A backslash keeps the next marker character as typed: `\*`, `\#`, `\-`, `\>`, `\[`, `\\`.
 * Windows (`\r\n`) and old Mac (`\r`) line ends count as line ends.
 */

/** A run of text inside a line. */
export type LightInline =
  | { readonly kind: 'text'; readonly text: string }
  | { readonly kind: 'emphasis'; readonly children: readonly LightInline[] }
  | { readonly kind: 'strong'; readonly children: readonly LightInline[] };

/** One line's runs. */
export type LightLine = readonly LightInline[];

/** One item of a list; `check` is null for a plain item. */
export interface LightListItem {
  readonly check: 'open' | 'done' | null;
  readonly content: LightLine;
}

/** A block of a page. Paragraphs and quotes keep the reader's line breaks as separate lines. */
export type LightBlock =
  | { readonly kind: 'heading'; readonly level: 1 | 2; readonly content: LightLine }
  | { readonly kind: 'paragraph'; readonly lines: readonly LightLine[] }
  | { readonly kind: 'quote'; readonly lines: readonly LightLine[] }
  | { readonly kind: 'list'; readonly items: readonly LightListItem[] };

const HEADING = /^(#{1,2})[ \t]+(.*)$/;
const CHECK = /^(?:-[ \t]+)?\[([ xX])\][ \t]+(.*)$/;
const BULLET = /^-[ \t]+(.*)$/;
const QUOTE = /^>[ \t]?(.*)$/;
const ESCAPABLE = new Set(['*', '#', '-', '>', '[', '\\']);

/**
 * Reads a page's text into blocks.
 *
 * @example
 * parseLightFormat('# Salt roads\nA **long** walk.')
 * // [{ kind: 'heading', level: 1, content: [{ kind: 'text', text: 'Salt roads' }] },
 * //  { kind: 'paragraph', lines: [[{ kind: 'text', text: 'A ' }, { kind: 'strong', … }, …]] }]
 */
export function parseLightFormat(text: string): LightBlock[] {
  const blocks: LightBlock[] = [];
  // The block being gathered, if it can take more lines.
  let open: { kind: 'paragraph' | 'quote'; lines: LightLine[] } | { kind: 'list'; items: LightListItem[] } | null = null;
  const close = () => {
    if (open) blocks.push(open);
    open = null;
  };

  for (const rawLine of text.split(/\r\n|\r|\n/)) {
    const line = rawLine.trimEnd();
    const marked = line.trimStart();
    if (marked === '') {
      close();
      continue;
    }
    const heading = HEADING.exec(marked);
    if (heading) {
      close();
      blocks.push({ kind: 'heading', level: heading[1]!.length as 1 | 2, content: parseInline(heading[2]!.trim()) });
      continue;
    }
    const check = CHECK.exec(marked);
    const bullet = check ? null : BULLET.exec(marked);
    if (check || bullet) {
      const item: LightListItem = check
        ? { check: check[1] === ' ' ? 'open' : 'done', content: parseInline(check[2]!) }
        : { check: null, content: parseInline(bullet![1]!) };
      if (open?.kind !== 'list') {
        close();
        open = { kind: 'list', items: [] };
      }
      open.items.push(item);
      continue;
    }
    const quote = QUOTE.exec(marked);
    const kind = quote ? 'quote' : 'paragraph';
    if (open?.kind !== kind) {
      close();
      open = { kind, lines: [] };
    }
    open.lines.push(parseInline(quote ? quote[1]! : line));
  }
  close();
  return blocks;
}

/**
 * Reads emphasis and strong runs in one line.
 *
 * @example
 * parseInline('a *b* c') // [text 'a ', emphasis [text 'b'], text ' c']
 */
export function parseInline(text: string): LightInline[] {
  const out: LightInline[] = [];
  let plain = '';
  const push = (node: LightInline) => {
    if (plain) out.push({ kind: 'text', text: plain });
    plain = '';
    out.push(node);
  };
  // A search for a closing marker that found none from some index finds none from any later
  // index either, so remember it: a line of many unpartnered markers stays linear.
  const noCloser = { strong: Infinity, emphasis: Infinity };

  let i = 0;
  while (i < text.length) {
    const ch = text[i]!;
    if (ch === '\\' && ESCAPABLE.has(text[i + 1] ?? '')) {
      plain += text[i + 1];
      i += 2;
      continue;
    }
    if (ch !== '*') {
      plain += ch;
      i++;
      continue;
    }
    const run = starRun(text, i);
    if (run >= 2) {
      const end = findCloser(text, i + 2, 'strong', noCloser);
      if (end !== -1) {
        push({ kind: 'strong', children: parseInline(text.slice(i + 2, end)) });
        i = end + 2;
        continue;
      }
    }
    // Only the run's last star can open emphasis; the ones before it stay as typed.
    const opener = i + run - 1;
    const end = findCloser(text, opener + 1, 'emphasis', noCloser);
    if (end !== -1) {
      plain += '*'.repeat(run - 1);
      push({ kind: 'emphasis', children: parseInline(text.slice(opener + 1, end)) });
      i = end + 1;
      continue;
    }
    plain += '*'.repeat(run);
    i += run;
  }
  if (plain) out.push({ kind: 'text', text: plain });
  return out;
}

/** The whole page as plain words, without markers: for excerpts and search. */
export function lightPlainText(blocks: readonly LightBlock[]): string {
  const line = (runs: LightLine): string => runs.map((run) => (run.kind === 'text' ? run.text : line(run.children))).join('');
  return blocks
    .map((block) => {
      switch (block.kind) {
        case 'heading':
          return line(block.content);
        case 'list':
          return block.items.map((item) => line(item.content)).join('\n');
        default:
          return block.lines.map(line).join('\n');
      }
    })
    .join('\n');
}

function starRun(text: string, from: number): number {
  let end = from;
  while (text[end] === '*') end++;
  return end - from;
}

const isSpace = (ch: string | undefined) => ch === undefined || /\s/.test(ch);

/**
 * Where the closing marker for content starting at `start` begins, or -1. The content must not
 * start or end with a space. Strong closes at a run of two or more stars (its last two);
 * emphasis at a single star or the last star of a run of three or more, skipping pairs, which
 * belong to strong runs inside it.
 */
function findCloser(text: string, start: number, kind: 'strong' | 'emphasis', noCloser: Record<'strong' | 'emphasis', number>): number {
  if (start >= noCloser[kind] || isSpace(text[start])) return -1;
  let j = start;
  while (j < text.length) {
    if (text[j] === '\\' && ESCAPABLE.has(text[j + 1] ?? '')) {
      j += 2;
      continue;
    }
    if (text[j] !== '*') {
      j++;
      continue;
    }
    const run = starRun(text, j);
    // A run right at the start is part of the opening marker's neighbourhood (`***x***`).
    if (j > start && !isSpace(text[j - 1])) {
      if (kind === 'strong' && run >= 2) return j + run - 2;
      if (kind === 'emphasis' && run !== 2) return j + run - 1;
    }
    j += run;
  }
  noCloser[kind] = Math.min(noCloser[kind], start);
  return -1;
}
