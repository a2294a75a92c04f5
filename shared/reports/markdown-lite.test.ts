import { describe, expect, test } from 'vitest';
import { renderMarkdownLite } from './markdown-lite.ts';

describe('renderMarkdownLite', () => {
  test.each([
    ['emphasis and strong', 'a *b* and **c**', '<p>a <em>b</em> and <strong>c</strong></p>\n'],
    ['inline code', 'use `A356.0`', '<p>use <code>A356.0</code></p>\n'],
    ['a bullet list', '- one\n- two', '<ul>\n<li>one</li>\n<li>two</li>\n</ul>\n'],
    ['a numbered list', '1. skim\n2. pour', '<ol>\n<li>skim</li>\n<li>pour</li>\n</ol>\n'],
    ['a line break', 'first\nsecond', '<p>first<br>\nsecond</p>\n'],
    ['two paragraphs', 'one\n\ntwo', '<p>one</p>\n<p>two</p>\n'],
  ])('when a comment uses %s, then it renders', (_what, text, html) => {
    expect(renderMarkdownLite(text)).toBe(html);
  });

  test.each([
    ['raw HTML', '<img src=x onerror=alert(1)>', /<img/],
    ['a script tag', '<script>alert(1)</script>', /<script/],
    ['a heading', '# Big', /<h1/],
    ['an image', '![x](https://example.test/a.png)', /<img/],
    ['a blockquote', '> quoted', /<blockquote/],
    ['an autolink', '<https://example.test>', /<a /],
  ])('when a comment holds %s, then no such markup comes out', (_what, text, forbidden) => {
    expect(renderMarkdownLite(text)).not.toMatch(forbidden);
  });

  test('when a comment holds raw HTML, then it is shown as escaped text', () => {
    expect(renderMarkdownLite('<img src=x onerror=alert(1)>')).toBe('<p>&lt;img src=x onerror=alert(1)&gt;</p>\n');
  });

  test.each([
    ['javascript:', '[run](javascript:alert(1))'],
    ['JavaScript: in capitals', '[run](JavaScript:alert(1))'],
    ['data:', '[run](data:text/html;base64,PHNjcmlwdD4=)'],
    ['a relative path', '[run](/api/auth/sign-out)'],
  ])('when a link points at %s, then no link is made', (_what, text) => {
    expect(renderMarkdownLite(text)).not.toMatch(/<a /);
  });

  test.each([
    ['https', '[guide](https://example.test/degassing)', 'https://example.test/degassing'],
    ['http', '[guide](http://example.test/)', 'http://example.test/'],
    ['mailto', '[mail me](mailto:priya@example.test)', 'mailto:priya@example.test'],
  ])('when a link is %s, then it is kept with rel="nofollow noopener"', (_what, text, href) => {
    expect(renderMarkdownLite(text)).toContain(`<a href="${href}" rel="nofollow noopener">`);
  });

  test('when a bare address is typed, then it stays text (no linkify)', () => {
    expect(renderMarkdownLite('see https://example.test')).toBe('<p>see https://example.test</p>\n');
  });
});
