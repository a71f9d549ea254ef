import type { ReactNode } from 'react';

/** One section of the report page: an h2 with an anchor the page's contents link to. */
export function ReportSection({ id, title, children, lede }: { id: string; title: string; lede?: ReactNode; children: ReactNode }) {
  return (
    <section id={id} aria-labelledby={`${id}-heading`} className="scroll-mt-6 space-y-6 border-t border-rule pt-8">
      <div className="max-w-measure space-y-2">
        <h2 id={`${id}-heading`} className="text-2xl font-semibold tracking-tight">
          {title}
        </h2>
        {lede ? <div className="text-ink-soft">{lede}</div> : null}
      </div>
      {children}
    </section>
  );
}

/** The sections in page order: the contents list and the sections share these ids. */
export const REPORT_SECTIONS = [
  { id: 'write-up', title: 'Write-up' },
  { id: 'unit', title: 'The unit and how it was measured' },
  { id: 'claims', title: 'Claims against measurements' },
  { id: 'coverage', title: 'Coverage per distance' },
  { id: 'profile', title: 'Profile and falloff' },
  { id: 'spectrum', title: 'The spectrum' },
  { id: 'dose', title: 'Dose table' },
  { id: 'planner', title: 'Session planner' },
  { id: 'safety', title: 'Safety and certainty' },
  { id: 'spread', title: 'Unit-to-unit spread' },
  { id: 'history', title: 'History and data' },
] as const;
export type ReportSectionId = (typeof REPORT_SECTIONS)[number]['id'];

export function sectionTitle(id: ReportSectionId): string {
  return REPORT_SECTIONS.find((s) => s.id === id)?.title ?? id;
}

/** "On this page": a link to each section present, for readers who jump. */
export function ReportContents({ ids }: { ids: readonly ReportSectionId[] }) {
  return (
    <nav aria-label="On this page" className="font-sans text-sm">
      <p className="bl-label mb-2">On this page</p>
      <ol className="flex flex-wrap gap-x-5 gap-y-1.5">
        {ids.map((id) => (
          <li key={id}>
            <a href={`#${id}`}>{sectionTitle(id)}</a>
          </li>
        ))}
      </ol>
    </nav>
  );
}
