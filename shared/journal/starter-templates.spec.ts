import { deterministicId } from '../sync/deterministic-id';
import { NOTEBOOK_LIMITS } from './notebook-limits';
import { TEMPLATE_PLACEHOLDERS } from './instantiate-template';
import { parseLightFormat } from './light-format';
import { ownTemplates, STARTER_TEMPLATES } from './starter-templates';

describe('starter templates', () => {
  it('have fixed name-based ids, unique names and only documented placeholders', () => {
    expect(STARTER_TEMPLATES.find((t) => t.name === 'After a sitting')?.id).toBe(deterministicId('starter-template', 'after-a-sitting'));
    expect(new Set(STARTER_TEMPLATES.map((t) => t.id)).size).toBe(STARTER_TEMPLATES.length);
    expect(new Set(STARTER_TEMPLATES.map((t) => t.name)).size).toBe(STARTER_TEMPLATES.length);
    const known = new Set<string>(TEMPLATE_PLACEHOLDERS.map((p) => p.name));
    for (const template of STARTER_TEMPLATES) {
      const used = [...`${template.title}\n${template.body}`.matchAll(/\{\{\s*(\w+)\s*\}\}/g)].map((m) => m[1]!);
      expect(used.filter((name) => !known.has(name)))
        .withContext(template.name)
        .toEqual([]);
      expect(template.starter).toBeTrue();
      expect(template.name.length).toBeLessThanOrEqual(NOTEBOOK_LIMITS.templateName);
      expect(parseLightFormat(template.body)[0]?.kind).withContext(template.name).toBe('heading');
    }
  });

  it('list the reader’s own templates by name, leaving out deleted and half-arrived ones', () => {
    expect(
      ownTemplates([
        { id: 't2', name: 'Weekend', body: 'b', deleted: false },
        { id: 't1', name: 'Commute', title: 'On the train', deleted: false },
        { id: 't3', name: 'Gone', deleted: true },
        { id: 't4', title: 'Still arriving' },
      ]),
    ).toEqual([
      { id: 't1', name: 'Commute', title: 'On the train', body: '', starter: false },
      { id: 't2', name: 'Weekend', title: '', body: 'b', starter: false },
    ]);
  });
});
