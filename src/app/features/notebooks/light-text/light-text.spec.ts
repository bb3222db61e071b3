import { TestBed } from '@angular/core/testing';

import { textOf } from '../../../core/testing/test-journal';
import { LightText } from './light-text';

describe('LightText', () => {
  async function render(text: string, headingLevel?: 2 | 3 | 4): Promise<HTMLElement> {
    const fixture = TestBed.createComponent(LightText);
    fixture.componentRef.setInput('text', text);
    if (headingLevel) fixture.componentRef.setInput('headingLevel', headingLevel);
    await fixture.whenStable();
    return fixture.nativeElement as HTMLElement;
  }

  it('draws headings, paragraphs with line breaks, lists, checkboxes, quotes, emphasis and strong', async () => {
    const element = await render('# Fen walk\n## Morning\nMist, then *sun*.\nA **long** day.\n\n- coot\n[ ] find the hide\n[x] flask\n\n> Stay until dusk.', 3);

    expect(textOf(element.querySelector('h3'))).toBe('Fen walk');
    expect(textOf(element.querySelector('h4'))).toBe('Morning');
    expect(element.querySelector('p')?.innerText).toBe('Mist, then sun.\nA long day.');
    expect(textOf(element.querySelector('p em'))).toBe('sun');
    expect(textOf(element.querySelector('p strong'))).toBe('long');
    const items = Array.from(element.querySelectorAll('ul li')).map((item) => textOf(item).replace(/^check_box(_outline_blank)?/, ''));
    expect(items).toEqual(['coot', 'To do: find the hide', 'Done: flask']);
    expect(element.querySelectorAll('li.check').length).toBe(2);
    expect(element.querySelectorAll('li.done').length).toBe(1);
    expect(textOf(element.querySelector('blockquote'))).toBe('Stay until dusk.');
  });

  it('shows markup as the text it is: no element is ever made from what was typed', async () => {
    const typed = '<script>window.pwned = true</script>\n# <img src=x onerror="window.pwned = true">\n**<b>bold</b>**';
    const element = await render(typed);

    expect(element.querySelector('script, img, b')).toBeNull();
    expect(textOf(element.querySelector('p'))).toBe('<script>window.pwned = true</script>');
    expect(textOf(element.querySelector('h2'))).toBe('<img src=x onerror="window.pwned = true">');
    expect(textOf(element.querySelector('strong'))).toBe('<b>bold</b>');
    expect((window as { pwned?: boolean }).pwned).toBeUndefined();
  });

  it('keeps the spaces between plain and formatted words', async () => {
    const element = await render('- a **b** c *d* e');
    expect(element.querySelector('li')?.textContent).toBe('a b c d e');
  });
});
