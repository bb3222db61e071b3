import { renderPostText } from '@shared/circles/post-format';

/** Parses the rendered HTML with the browser’s own parser (not ours) to check what it would run (the spec lives in src/: shared/ has no DOM). */
function parsed(text: string): HTMLElement {
  const container = document.createElement('div');
  container.innerHTML = renderPostText(text);
  return container;
}

describe('renderPostText (light formatting in posts, markdown-it)', () => {
  it('formats bold, italic, links, line breaks and quotes', () => {
    const html = parsed('**Loved** the *storm* chapter\nsee [notes](http://127.0.0.1/notes)\n\n> the sea keeps no ledgers');
    expect(html.querySelector('strong')!.textContent).toBe('Loved');
    expect(html.querySelector('em')!.textContent).toBe('storm');
    expect(html.querySelectorAll('br').length).toBe(1);
    const link = html.querySelector('a')!;
    expect(link.getAttribute('href')).toBe('http://127.0.0.1/notes');
    expect(link.getAttribute('rel')).toBe('noopener noreferrer nofollow');
    expect(html.querySelector('blockquote')!.textContent!.trim()).toBe('the sea keeps no ledgers');
  });

  it('shows HTML as text: no element, no event handler from a post', () => {
    const html = parsed('<img src=x onerror="alert(1)"> <script>alert(2)</script> <b onclick="x()">hi</b>');
    expect(html.querySelector('img, script, b, [onerror], [onclick]')).toBeNull();
    expect(html.textContent).toContain('<img src=x onerror="alert(1)">');
  });

  it('makes javascript:, data: and vbscript: links plain text', () => {
    const html = parsed('[a](javascript:alert(1)) [b](JaVaScRiPt:alert(1)) [c](data:text/html;base64,PHNjcmlwdD4=) [d](vbscript:msgbox) [e]( javascript:alert(1))');
    expect(html.querySelectorAll('a').length).toBe(0);
    expect(html.innerHTML).not.toMatch(/href=/i);
  });

  it('leaves out what is not light formatting: images, headings, lists, code', () => {
    const html = parsed('![cover](http://127.0.0.1/x.png)\n\n# Shouting\n\n- one\n\n`code`');
    expect(html.querySelector('img, h1, ul, li, code')).toBeNull();
  });
});
