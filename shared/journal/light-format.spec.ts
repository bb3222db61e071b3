import fc from 'fast-check';

import { lightPlainText, parseInline, parseLightFormat, type LightInline } from './light-format';
import { expectProperty } from '../testing/expect-property';

const text = (value: string): LightInline => ({ kind: 'text', text: value });
const em = (...children: LightInline[]): LightInline => ({ kind: 'emphasis', children });
const strong = (...children: LightInline[]): LightInline => ({ kind: 'strong', children });

describe('light formatting', () => {
  describe('blocks', () => {
    it('reads headings, paragraphs with their line breaks, lists, checkboxes and quotes', () => {
      const page = [
        '# Marsh birds',
        '## Day one',
        'Rain all morning.',
        'Then the heron.',
        '',
        '- a grey one',
        '- [ ] find the bird book',
        '[x] walk the dyke',
        '[X] sketch it',
        '> The tide does not',
        '> wait for the reader.',
      ].join('\n');

      expect(parseLightFormat(page)).toEqual([
        { kind: 'heading', level: 1, content: [text('Marsh birds')] },
        { kind: 'heading', level: 2, content: [text('Day one')] },
        { kind: 'paragraph', lines: [[text('Rain all morning.')], [text('Then the heron.')]] },
        {
          kind: 'list',
          items: [
            { check: null, content: [text('a grey one')] },
            { check: 'open', content: [text('find the bird book')] },
            { check: 'done', content: [text('walk the dyke')] },
            { check: 'done', content: [text('sketch it')] },
          ],
        },
        { kind: 'quote', lines: [[text('The tide does not')], [text('wait for the reader.')]] },
      ]);
    });

    it('treats Windows and old Mac line ends like \\n', () => {
      const unix = parseLightFormat('# Title\nline one\nline two\n\n- item');
      expect(parseLightFormat('# Title\r\nline one\r\nline two\r\n\r\n- item')).toEqual(unix);
      expect(parseLightFormat('# Title\rline one\rline two\r\r- item')).toEqual(unix);
      expect(JSON.stringify(parseLightFormat('a\r\nb'))).not.toContain('\\r');
    });

    it('keeps markers without their space, a third heading level and escaped markers as typed', () => {
      expect(parseLightFormat('#hashtag\n-5 degrees\n### three\n[]not a box\n\\# not a heading\n\\- nor a list\n\\> nor a quote')).toEqual([
        {
          kind: 'paragraph',
          lines: [
            [text('#hashtag')],
            [text('-5 degrees')],
            [text('### three')],
            [text('[]not a box')],
            [text('# not a heading')],
            [text('- nor a list')],
            [text('> nor a quote')],
          ],
        },
      ]);
    });

    it('ends a list or quote at a line without its marker, and ignores blank lines and surrounding spaces', () => {
      expect(parseLightFormat('\n\n  - one  \n   two\n>q\nplain\n\n\n')).toEqual([
        { kind: 'list', items: [{ check: null, content: [text('one')] }] },
        { kind: 'paragraph', lines: [[text('   two')]] },
        { kind: 'quote', lines: [[text('q')]] },
        { kind: 'paragraph', lines: [[text('plain')]] },
      ]);
      expect(parseLightFormat('')).toEqual([]);
      expect(parseLightFormat('  \n\t\n')).toEqual([]);
    });

    it('keeps HTML as plain text: there is no HTML anywhere in the result', () => {
      const blocks = parseLightFormat('<script>alert("hi")</script>\n# <img src=x onerror=alert(1)>\n- **<b>bold?</b>**');
      expect(blocks).toEqual([
        { kind: 'paragraph', lines: [[text('<script>alert("hi")</script>')]] },
        { kind: 'heading', level: 1, content: [text('<img src=x onerror=alert(1)>')] },
        { kind: 'list', items: [{ check: null, content: [strong(text('<b>bold?</b>'))] }] },
      ]);
    });
  });

  describe('emphasis and strong', () => {
    it('reads *emphasis*, **strong**, and one inside the other', () => {
      expect(parseInline('a *soft* and **firm** word')).toEqual([text('a '), em(text('soft')), text(' and '), strong(text('firm')), text(' word')]);
      expect(parseInline('**very *much* so**')).toEqual([strong(text('very '), em(text('much')), text(' so'))]);
      expect(parseInline('*quite **so** really*')).toEqual([em(text('quite '), strong(text('so')), text(' really'))]);
      expect(parseInline('***both***')).toEqual([strong(em(text('both')))]);
    });

    it('keeps unclosed, empty and spaced-out markers as typed', () => {
      expect(parseInline('an *unclosed marker')).toEqual([text('an *unclosed marker')]);
      expect(parseInline('**half strong*')).toEqual([text('*'), em(text('half strong'))]);
      expect(parseInline('** not strong **')).toEqual([text('** not strong **')]);
      expect(parseInline('5 * 3 * 2 = 30')).toEqual([text('5 * 3 * 2 = 30')]);
      expect(parseInline('****')).toEqual([text('****')]);
      expect(parseInline('*')).toEqual([text('*')]);
      expect(parseInline('a ** b')).toEqual([text('a ** b')]);
    });

    it('keeps a backslashed star as a star, and a lone backslash as a backslash', () => {
      expect(parseInline('\\*not emphasis\\*')).toEqual([text('*not emphasis*')]);
      expect(parseInline('*a \\* b*')).toEqual([em(text('a * b'))]);
      expect(parseInline('C:\\path\\\\here\\')).toEqual([text('C:\\path\\here\\')]);
    });

    it('handles a long line of unpartnered markers quickly enough for live preview', () => {
      const line = '*a '.repeat(20_000);
      expect(lightPlainText(parseLightFormat(line))).toBe(line.trimEnd());
    });
  });

  it('never loses or invents words: the plain text is the typed text without markers (property)', () => {
    // Text without markers or special line starts comes back word for word.
    const word = fc.stringMatching(/^[A-Za-z0-9 .,;!?'"<>&()]{0,30}$/);
    expectProperty(
      fc.property(fc.array(word, { maxLength: 8 }), (lines) => {
        const typed = lines.map((line) => line.trim()).filter((line) => line !== '' && !/^[>]/.test(line));
        expect(lightPlainText(parseLightFormat(typed.join('\n')))).toBe(typed.join('\n'));
      }),
    );
  });

  it('never throws, whatever is typed (property)', () => {
    expectProperty(
      fc.property(fc.string({ unit: fc.constantFrom('*', '\\', '#', '-', '>', '[', ']', 'x', ' ', '\n', '\r', 'a') }), (typed) => {
        expect(() => parseLightFormat(typed)).not.toThrow();
      }),
    );
  });
});
