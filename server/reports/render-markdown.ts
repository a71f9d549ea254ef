/**
 * A report's write-up: Markdown rendered with marked, then cleaned with sanitize-html to a short
 * allow-list. Script, event handlers, `javascript:` (and every scheme but http, https and mailto)
 * and inline styles never survive, whatever the Markdown holds (raw HTML included).
 */
import { marked } from 'marked';
import sanitizeHtml from 'sanitize-html';

const OPTIONS: sanitizeHtml.IOptions = {
  allowedTags: ['h2', 'h3', 'h4', 'p', 'br', 'hr', 'ul', 'ol', 'li', 'strong', 'em', 'code', 'pre', 'blockquote', 'a', 'table', 'thead', 'tbody', 'tr', 'th', 'td', 'sup', 'sub'],
  allowedAttributes: { a: ['href', 'title'], th: ['scope'], td: [] },
  allowedSchemes: ['http', 'https', 'mailto'],
  allowedSchemesAppliedToAttributes: ['href'],
  allowProtocolRelative: false,
  disallowedTagsMode: 'discard',
  // Headings in a write-up sit under the page's own h1 and section headings.
  transformTags: { h1: 'h2', a: sanitizeHtml.simpleTransform('a', { rel: 'nofollow noopener' }) },
};
OPTIONS.allowedAttributes = { ...OPTIONS.allowedAttributes, a: ['href', 'title', 'rel'] };

export function renderMarkdown(markdown: string): string {
  const html = marked.parse(markdown, { async: false, gfm: true }) as string;
  return sanitizeHtml(html, OPTIONS);
}

const DOC_OPTIONS: sanitizeHtml.IOptions = {
  ...OPTIONS,
  allowedTags: [...(OPTIONS.allowedTags as string[]), 'h1'],
  transformTags: {},
  allowedAttributes: { a: ['href', 'title'], th: ['scope', 'align'], td: ['align'], code: ['class'] },
};

/** The lab's own documents (the methodology), with their top heading kept. */
export function renderDocument(markdown: string): string {
  return sanitizeHtml(marked.parse(markdown, { async: false, gfm: true }) as string, DOC_OPTIONS);
}
