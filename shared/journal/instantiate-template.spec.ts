import { instantiateTemplate, placeholderValues, TEMPLATE_PLACEHOLDERS } from './instantiate-template';

describe('instantiateTemplate', () => {
  const context = { today: '2026-03-08', bookTitle: 'The Salt Roads', bookAuthors: ['Wren Okafor', 'Ada Lindqvist'], notebookTitle: 'Coast reading' };

  it('fills every documented placeholder', () => {
    const page = instantiateTemplate({ title: '{{book}} · {{weekday}} {{date}}', body: '{{month}} {{year}}, {{notebook}}, by {{author}}' }, context);
    // 2026-03-08 is a Sunday: checked against Intl.DateTimeFormat below, and any calendar.
    expect(page).toEqual({ title: 'The Salt Roads · Sunday 2026-03-08', body: 'March 2026, Coast reading, by Wren Okafor, Ada Lindqvist' });
    expect(TEMPLATE_PLACEHOLDERS.map((p): string => p.name).sort()).toEqual(Object.keys(placeholderValues(context)).sort());
  });

  it('keeps unknown placeholders and near-misses as typed; names are case-insensitive and may have spaces', () => {
    const body = '{{mood}} {{ Date }} {{DATE}} {date} {{ date } {{da te}} {{}} {{{date}}}';
    expect(instantiateTemplate({ body }, context).body).toBe('{{mood}} 2026-03-08 2026-03-08 {date} {{ date } {{da te}} {{}} {2026-03-08}');
  });

  it('leaves book placeholders empty without a book, and never fills a value twice', () => {
    expect(instantiateTemplate({ title: 'On {{book}}.', body: '{{author}}' }, { today: '2026-03-08' })).toEqual({ title: 'On .', body: '' });
    // A book whose title itself looks like a placeholder stays as it is.
    expect(instantiateTemplate({ title: '{{book}}' }, { today: '2026-03-08', bookTitle: 'The {{date}} Affair' }).title).toBe('The {{date}} Affair');
  });

  it('treats absent title or body as empty, and a template without placeholders as it is', () => {
    expect(instantiateTemplate({ title: null }, context)).toEqual({ title: '', body: '' });
    expect(instantiateTemplate({ title: 'Plain', body: '# Just **words**' }, context)).toEqual({ title: 'Plain', body: '# Just **words**' });
  });

  it('refuses a date that is not a real calendar date', () => {
    for (const today of ['2026-02-30', '2026-13-01', '08/03/2026', '2026-3-8', '']) {
      expect(() => instantiateTemplate({ body: '{{date}}' }, { today })).toThrowError(RangeError);
    }
    expect(instantiateTemplate({ body: '{{weekday}}' }, { today: '2024-02-29' }).body).toBe('Thursday');
  });

  it('names weekdays and months as Intl.DateTimeFormat (en, UTC) does, for every day from 1999 to 2031', () => {
    // Reference: the ECMAScript Internationalization API (ECMA-402), independent of our tables.
    const weekday = new Intl.DateTimeFormat('en', { weekday: 'long', timeZone: 'UTC' });
    const month = new Intl.DateTimeFormat('en', { month: 'long', timeZone: 'UTC' });
    const mismatches: string[] = [];
    for (let ms = Date.UTC(1999, 0, 1); ms <= Date.UTC(2031, 11, 31); ms += 86_400_000) {
      const today = new Date(ms).toISOString().slice(0, 10);
      const values = placeholderValues({ today });
      if (values.weekday !== weekday.format(ms) || values.month !== month.format(ms) || values.year !== today.slice(0, 4)) mismatches.push(today);
    }
    expect(mismatches).toEqual([]);
  });

  it("names the weekday and month in the reader's locale when one is given (Unicode CLDR: dimanche, mars)", () => {
    const values = placeholderValues({ today: '2026-03-08', locale: 'fr-FR' });
    expect(values.weekday).toBe('dimanche');
    expect(values.month).toBe('mars');
  });
});
