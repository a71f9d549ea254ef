import { useMemo } from 'react';
import { demoteHeadings } from '../utils/demote-headings.ts';
import { ReportSection } from './report-section.tsx';

/**
 * The editors' write-up. The server renders the Markdown and cleans it (no script, event handlers,
 * javascript: links or inline styles survive), so it is inserted as given; its own headings move
 * one level down to sit under this section's heading.
 */
export function WriteUp({ html }: { html: string }) {
  const demoted = useMemo(() => demoteHeadings(html, 1), [html]);
  if (!html.trim()) return null;
  return (
    <ReportSection id="write-up" title="Write-up">
      <div
        className="max-w-measure space-y-3 [&_a]:underline [&_h3]:mt-6 [&_h3]:text-xl [&_h3]:font-semibold [&_h4]:mt-4 [&_h4]:font-semibold [&_li]:mt-1 [&_ol]:list-decimal [&_ol]:pl-6 [&_ul]:list-disc [&_ul]:pl-6"
        // Sanitised on the server (marked, then sanitize-html) before it was stored.
        dangerouslySetInnerHTML={{ __html: demoted }}
      />
    </ReportSection>
  );
}
