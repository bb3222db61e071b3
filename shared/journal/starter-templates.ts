import { deterministicId } from '../sync/deterministic-id';
import type { PageTemplate } from '../sync/schema/collections';

/** A page template as the template chooser shows it: the reader's own, or one that ships with the app. */
export interface TemplateView {
  readonly id: string;
  readonly name: string;
  readonly title: string;
  readonly body: string;
  /** Ships with Lamplight: it cannot be renamed or deleted, and is never synced. */
  readonly starter: boolean;
}

const starters: readonly (Omit<TemplateView, 'id' | 'starter'> & { key: string })[] = [
  {
    key: 'after-a-sitting',
    name: 'After a sitting',
    title: '{{book}} · {{weekday}} {{date}}',
    body: [
      '## Where I stopped',
      'Page or chapter: ',
      '',
      '## What happened',
      '- ',
      '',
      '## A line that stayed with me',
      '> ',
      '',
      '## Before I pick it up again',
      '[ ] ',
    ].join('\n'),
  },
  {
    key: 'opening-pages',
    name: 'Opening pages',
    title: 'Opening pages of {{book}}',
    body: ['## The first few pages', 'How it begins, in a sentence or two.', '', '## Who I have met', '- ', '', '## What I hope for', '', '## What worries me'].join(
      '\n',
    ),
  },
  {
    key: 'threads-to-follow',
    name: 'Threads to follow',
    title: 'Threads · {{month}} {{year}}',
    body: ['## Threads', '- ', '', '## Where they might lead', '', '## Look up later', '[ ] '].join('\n'),
  },
  {
    key: 'talking-it-over',
    name: 'Talking it over',
    title: 'To talk over: {{book}}',
    body: ['## What I want to ask', '- ', '', '## Where I disagree', '', '## A passage to read aloud', '> ', '', '## After we talked'].join('\n'),
  },
];

/**
 * Templates of our own that every reader starts with. They are constants, not synced rows; their
 * ids are name-based so a device can refer to one (in a link, a last-used choice) and every
 * device agrees which it is.
 */
export const STARTER_TEMPLATES: readonly TemplateView[] = starters.map(({ key, ...template }) => ({
  id: deterministicId('starter-template', key),
  ...template,
  starter: true,
}));

/**
 * The reader's own templates, ready to choose from, by name. Deleted ones are left out, and so
 * are ones still arriving in pieces from another device (no name yet).
 */
export function ownTemplates(stored: readonly PageTemplate[]): TemplateView[] {
  return stored
    .filter((template) => !template.deleted && template.name)
    .map((template) => ({ id: template.id, name: template.name!, title: template.title ?? '', body: template.body ?? '', starter: false }))
    .sort((a, b) => a.name.localeCompare(b.name) || (a.id < b.id ? -1 : 1));
}
