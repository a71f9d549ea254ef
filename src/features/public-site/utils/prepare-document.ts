export interface TocEntry {
  id: string;
  text: string;
  children: { id: string; text: string }[];
}

/** "4. Coverage map, isolines, body overlay" → "4-coverage-map-isolines-body-overlay". */
export function headingId(text: string): string {
  return (
    text
      .normalize('NFKD')
      .replace(/[\u0300-\u036f]/g, '')
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, '-')
      .replace(/^-+|-+$/g, '')
      .slice(0, 60) || 'section'
  );
}

/**
 * Readies the server's sanitised HTML of a document for a page that already has its h1: drops the
 * document's own leading h1, gives h2 and h3 ids (for the table of contents and links), and puts
 * each wide table and code block in a keyboard-scrollable region. Parsed with DOMParser, which runs
 * no script, so nothing the server let through gains a way to run.
 */
export function prepareDocument(html: string): { html: string; toc: TocEntry[] } {
  const doc = new DOMParser().parseFromString(`<body>${html}</body>`, 'text/html');
  const body = doc.body;
  const first = body.firstElementChild;
  if (first?.tagName === 'H1') first.remove();

  const taken = new Set<string>();
  const toc: TocEntry[] = [];
  for (const h of body.querySelectorAll('h2, h3')) {
    const text = (h.textContent ?? '').trim();
    let id = headingId(text);
    for (let k = 2; taken.has(id); k++) id = `${headingId(text)}-${k}`;
    taken.add(id);
    h.id = id;
    if (h.tagName === 'H2') toc.push({ id, text, children: [] });
    else toc.at(-1)?.children.push({ id, text });
  }

  // A table is named after the section it sits in (document order: headings and tables interleaved).
  let section = 'the introduction';
  const counts = new Map<string, number>();
  for (const el of [...body.querySelectorAll('h2, h3, table')]) {
    if (el.tagName !== 'TABLE') {
      section = (el.textContent ?? '').trim();
      continue;
    }
    const n = (counts.get(section) ?? 0) + 1;
    counts.set(section, n);
    const wrap = doc.createElement('div');
    wrap.setAttribute('role', 'region');
    wrap.setAttribute('tabindex', '0');
    wrap.setAttribute('aria-label', `Table ${n > 1 ? `${n} ` : ''}in ${section}, scrollable`);
    wrap.className = 'bl-doc-table';
    el.replaceWith(wrap);
    wrap.append(el);
  }
  for (const pre of body.querySelectorAll('pre')) pre.setAttribute('tabindex', '0');
  return { html: body.innerHTML, toc };
}
