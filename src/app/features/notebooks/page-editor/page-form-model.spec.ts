import { changedPageFields, toPageFields } from './page-form-model';

describe('page form model', () => {
  it('trims the title, keeps the body exactly as typed, and stores blanks as null', () => {
    expect(toPageFields({ title: '  Day one ', body: '  - indented\n' })).toEqual({ title: 'Day one', body: '  - indented\n' });
    expect(toPageFields({ title: '   ', body: '\n\n' })).toEqual({ title: null, body: null });
  });

  it('sends only the fields the reader changed', () => {
    const before = { title: 'Day one', body: 'Rain.' };
    expect(changedPageFields(before, { title: 'Day one ', body: 'Rain, then sun.' })).toEqual({ body: 'Rain, then sun.' });
    expect(changedPageFields(before, { title: 'Day two', body: 'Rain.' })).toEqual({ title: 'Day two' });
    expect(changedPageFields(before, before)).toEqual({});
  });
});
