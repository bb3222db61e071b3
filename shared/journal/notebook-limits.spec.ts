import { validatePatch } from '../sync/validate-patch';
import { notebookPages, notebooks, pageTemplates } from '../sync/schema/collections';
import { field, maxTextLength } from '../sync/schema/field';
import { NOTEBOOK_LIMITS } from './notebook-limits';

describe('notebook limits', () => {
  it('are the lengths the schema itself accepts: the limit passes, one more is refused', () => {
    const cases = [
      [notebooks, 'title', NOTEBOOK_LIMITS.notebookTitle],
      [notebookPages, 'title', NOTEBOOK_LIMITS.pageTitle],
      [notebookPages, 'body', NOTEBOOK_LIMITS.pageBody],
      [pageTemplates, 'name', NOTEBOOK_LIMITS.templateName],
      [pageTemplates, 'title', NOTEBOOK_LIMITS.templateTitle],
      [pageTemplates, 'body', NOTEBOOK_LIMITS.templateBody],
    ] as const;
    for (const [collection, name, limit] of cases) {
      expect(validatePatch(collection, { [name]: 'x'.repeat(limit) }))
        .withContext(`${collection.name}.${name}`)
        .toEqual({});
      expect(Object.keys(validatePatch(collection, { [name]: 'x'.repeat(limit + 1) })))
        .withContext(`${collection.name}.${name}`)
        .toEqual([name]);
    }
    expect(NOTEBOOK_LIMITS).toEqual({ notebookTitle: 300, pageTitle: 300, pageBody: 50_000, templateName: 120, templateTitle: 300, templateBody: 50_000 });
  });

  it('refuse a field that is not text with a maximum', () => {
    expect(() => maxTextLength(field.optionalInteger(1, 2))).toThrowError();
  });
});
