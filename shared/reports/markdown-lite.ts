import MarkdownIt from 'markdown-it';

// Comments are written in a small slice of Markdown: emphasis, strong, code,
// links, lists, paragraphs and line breaks. Everything else, raw HTML
// included, stays visible as the text that was typed and is never rendered,
// so a comment cannot inject markup into a mentor's or a student's page.
// This is the one file in shared/ that imports a package besides zod:
// server and client must render a comment identically.

const ENABLED_RULES = ['paragraph', 'list', 'newline', 'escape', 'entity', 'backticks', 'emphasis', 'link'];

/** Link targets a comment may point at; anything else (javascript:, data:, relative) is shown as text. */
const ALLOWED_LINK = /^(https?:\/\/|mailto:)/i;

const md = new MarkdownIt('zero', { html: false, linkify: false, typographer: false, breaks: true });
md.enable(ENABLED_RULES);
md.validateLink = (url: string) => ALLOWED_LINK.test(url.trim());

const renderLinkOpen = md.renderer.rules.link_open;
md.renderer.rules.link_open = (tokens, idx, options, env, self) => {
  // A stranger's link in a comment earns no ranking and gets no window.opener.
  tokens[idx].attrSet('rel', 'nofollow noopener');
  return renderLinkOpen ? renderLinkOpen(tokens, idx, options, env, self) : self.renderToken(tokens, idx, options);
};

/** Renders a comment's raw text to safe HTML (the slice of Markdown described above). */
export function renderMarkdownLite(text: string): string {
  return md.render(text);
}
