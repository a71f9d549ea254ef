import { CATEGORY_LABELS, type ModelCategory } from '#shared/schemas/models.ts';
import type { PublicReport } from '#shared/schemas/reports.ts';
import { PageHeader } from '#src/components/page-header.tsx';
import { UnitsToggle } from '#src/components/units-toggle.tsx';
import { useDisplayUnits } from '#src/lib/display-units.tsx';
import { formatFigure } from '#src/lib/format.ts';
import { CorrectionBanner, EarlierVersionNotice, PreviewBanner, RetractionBanner, VersionLine } from './version-banners.tsx';

function categoryLabel(category: string): string {
  return CATEGORY_LABELS[category as ModelCategory] ?? category;
}

/** The figures a reader looks for first, in the reader's units. */
function KeyFigures({ report }: { report: PublicReport }) {
  const units = useDisplayUnits();
  const k = report.keyFigures;
  const items: { label: string; value: string }[] = [
    { label: `Centre irradiance at ${units.formatLength(15)}`, value: units.formatIrradiance(k.centerMwCm2At15) },
    { label: `Centre irradiance at ${units.formatLength(30)}`, value: units.formatIrradiance(k.centerMwCm2At30) },
    { label: 'Red share of red + near-infrared', value: k.redSharePct === null ? '—' : `${formatFigure(k.redSharePct)} %` },
    { label: `50 % spread width at ${units.formatLength(15)}`, value: units.formatLength(k.spread50CmAt15) },
    { label: 'Uniformity over the emitting area (min ÷ mean)', value: k.footprintUniformity === null ? '—' : formatFigure(k.footprintUniformity) },
    { label: 'Measured ÷ claimed irradiance', value: k.measuredOverClaimed === null ? '—' : formatFigure(k.measuredOverClaimed) },
  ];
  return (
    <section aria-labelledby="key-figures-heading" className="space-y-2">
      <h2 id="key-figures-heading" className="bl-label">
        Key figures
      </h2>
      <dl className="grid grid-cols-2 gap-x-6 gap-y-3 sm:grid-cols-3 lg:grid-cols-6">
        {items.map((i) => (
          <div key={i.label} className="border-l-2 border-rule pl-3">
            <dt className="font-sans text-xs text-ink-soft">{i.label}</dt>
            <dd className="text-lg font-semibold tabular-nums">{i.value}</dd>
          </div>
        ))}
      </dl>
    </section>
  );
}

/**
 * The top of a report: title and summary, a retraction (above all else), the version line with a
 * correction's note or the way to the latest version, the reader's units and the key figures.
 */
export function ReportHeader({ report }: { report: PublicReport }) {
  return (
    <div className="space-y-6">
      {report.preview ? <PreviewBanner version={report.version} /> : null}
      <div className="[&>div]:mb-0">
        <PageHeader
          eyebrow={`Report · ${report.model.makerName} · ${categoryLabel(report.category)}`}
          title={report.title}
          description={report.summary}
        />
      </div>
      {report.retracted ? <RetractionBanner retracted={report.retracted} /> : null}
      <VersionLine report={report} />
      <CorrectionBanner report={report} />
      <EarlierVersionNotice report={report} />
      <div className="flex flex-wrap items-end justify-between gap-6 rounded-md border border-rule bg-paper-raised px-5 py-4">
        <p className="max-w-xs font-sans text-sm text-ink-soft">
          Figures, maps and charts on this page follow your choice of units.
        </p>
        <UnitsToggle />
      </div>
      <KeyFigures report={report} />
    </div>
  );
}
