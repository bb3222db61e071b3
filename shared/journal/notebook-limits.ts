import { maxTextLength } from '../sync/schema/field';
import { notebookPages, notebooks, pageTemplates } from '../sync/schema/collections';

/** Lengths the notebook forms check before writing, read from the schema so they never drift. */
export const NOTEBOOK_LIMITS = {
  notebookTitle: maxTextLength(notebooks.fields.title),
  pageTitle: maxTextLength(notebookPages.fields.title),
  pageBody: maxTextLength(notebookPages.fields.body),
  templateName: maxTextLength(pageTemplates.fields.name),
  templateTitle: maxTextLength(pageTemplates.fields.title),
  templateBody: maxTextLength(pageTemplates.fields.body),
} as const;
