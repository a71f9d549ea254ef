import { useMemo } from 'react';
import { ProseHtml } from '#src/components/prose-html.tsx';
import { prepareDocument, type TocEntry } from '../utils/prepare-document.ts';

function TableOfContents({ toc }: { toc: readonly TocEntry[] }) {
  return (
    <nav aria-labelledby="toc-heading" className="font-sans text-sm lg:sticky lg:top-6 lg:max-h-[calc(100vh-3rem)] lg:overflow-y-auto">
      <h2 id="toc-heading" className="bl-label mb-2">
        On this page
      </h2>
      <ol className="space-y-1.5 border-l border-rule pl-3">
        {toc.map((e) => (
          <li key={e.id}>
            <a href={`#${e.id}`} className="font-semibold no-underline hover:underline">
              {e.text}
            </a>
            {e.children.length ? (
              <ol className="mt-1 space-y-1 pl-3">
                {e.children.map((c) => (
                  <li key={c.id}>
                    <a href={`#${c.id}`} className="text-ink-soft no-underline hover:underline">
                      {c.text}
                    </a>
                  </li>
                ))}
              </ol>
            ) : null}
          </li>
        ))}
      </ol>
    </nav>
  );
}

/** The methodology as the server rendered it, with a table of contents beside it on wide screens. */
export function MethodologyDocument({ html }: { html: string }) {
  const prepared = useMemo(() => prepareDocument(html), [html]);
  return (
    <div className="grid gap-10 lg:grid-cols-[15rem_minmax(0,1fr)] lg:items-start">
      {prepared.toc.length > 1 ? <TableOfContents toc={prepared.toc} /> : <div />}
      <article aria-label="Methodology" className="min-w-0">
        <ProseHtml html={prepared.html} />
      </article>
    </div>
  );
}
