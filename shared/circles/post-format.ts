import MarkdownIt from 'markdown-it';

/**
 * Light formatting in circle posts, with markdown-it: **bold**, *italic*, [links](https://…),
 * line breaks and > quotes, nothing else (no headings, lists, images, code or raw HTML). HTML in a
 * post is shown as text (`html: false`); markdown-it's own `validateLink` refuses `javascript:`,
 * `vbscript:`, `file:` and `data:` links; we also keep only http(s) and mailto links, opened
 * without the referrer.
 */
const markdown = new MarkdownIt('zero', { html: false, breaks: true, linkify: false }).enable(['emphasis', 'link', 'newline', 'blockquote', 'escape']);

const SAFE_LINK = /^(https?:|mailto:)/i;
const defaultValidateLink = markdown.validateLink.bind(markdown);
markdown.validateLink = (url) => defaultValidateLink(url) && SAFE_LINK.test(url.trim());

const renderLinkOpen = markdown.renderer.rules['link_open'] ?? ((tokens, index, options, _env, self) => self.renderToken(tokens, index, options));
markdown.renderer.rules['link_open'] = (tokens, index, options, env, self) => {
  tokens[index]!.attrSet('rel', 'noopener noreferrer nofollow');
  return renderLinkOpen(tokens, index, options, env, self);
};

/** A post's text as safe HTML for the discussion page. */
export function renderPostText(text: string): string {
  return markdown.render(text);
}
