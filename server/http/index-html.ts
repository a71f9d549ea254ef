/**
 * The client's index.html with a page's own title, description and social-card metadata, so a
 * shared link to a report shows the report (link previews do not run the page's scripts).
 */
export interface PageMeta {
  title: string;
  description: string;
  url: string;
}

const attr = (s: string) => s.replace(/&/g, '&amp;').replace(/"/g, '&quot;').replace(/</g, '&lt;').replace(/>/g, '&gt;');

export function withPageMeta(indexHtml: string, meta: PageMeta): string {
  const description = meta.description.length > 300 ? `${meta.description.slice(0, 297)}…` : meta.description;
  const tags = [
    `<meta name="description" content="${attr(description)}" />`,
    `<meta property="og:type" content="article" />`,
    `<meta property="og:site_name" content="Benchlight" />`,
    `<meta property="og:title" content="${attr(meta.title)}" />`,
    `<meta property="og:description" content="${attr(description)}" />`,
    `<meta property="og:url" content="${attr(meta.url)}" />`,
    `<meta name="twitter:card" content="summary" />`,
    `<meta name="twitter:title" content="${attr(meta.title)}" />`,
    `<meta name="twitter:description" content="${attr(description)}" />`,
    `<link rel="canonical" href="${attr(meta.url)}" />`,
  ].join('\n    ');
  return indexHtml
    .replace(/<title>[\s\S]*?<\/title>/, `<title>${attr(meta.title)} · Benchlight</title>`)
    .replace(/<meta name="description"[^>]*>\s*/i, '')
    .replace('</head>', `    ${tags}\n  </head>`);
}
