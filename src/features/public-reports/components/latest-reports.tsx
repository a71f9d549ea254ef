import { Link } from 'react-router-dom';
import type { PublicReportSummary } from '#shared/schemas/reports.ts';
import { ErrorState } from '#src/components/error-state.tsx';
import { Spinner } from '#src/components/spinner.tsx';
import { useDisplayUnits } from '#src/lib/display-units.tsx';
import { formatDate } from '#src/lib/format.ts';
import { usePublicReports } from '../api/get-public-reports.ts';
import { categoryLabel } from '../utils/category.ts';
import { KEY_FIGURES, type KeyFigureId } from '../utils/key-figures.ts';
import { CoverageThumbnail } from './coverage-thumbnail.tsx';
import { EmptyFigure } from './empty-figure.tsx';

/** How many reports the home page lists; the index has them all. */
const LATEST = 6;
/** The figures a card shows: the ones a reader compares first. */
const CARD_FIGURES: readonly KeyFigureId[] = ['center15', 'center30', 'spread50', 'redShare'];

function ReportCard({ report }: { report: PublicReportSummary }) {
  const units = useDisplayUnits();
  const headingId = `latest-${report.slug}`;
  const name = `${report.maker} ${report.model}`;
  return (
    <li>
      <article
        aria-labelledby={headingId}
        className="grid gap-5 rounded-md border border-rule bg-paper-raised px-5 py-4 shadow-sheet sm:grid-cols-[12rem_minmax(0,1fr)]"
      >
        <div className="space-y-1">
          {report.thumbnail ? (
            <CoverageThumbnail thumbnail={report.thumbnail} label={name} />
          ) : (
            <p className="font-sans text-xs text-ink-muted">No coverage picture</p>
          )}
          {report.thumbnail ? (
            <p className="font-sans text-xs text-ink-muted">
              Coverage at {units.formatLength(report.thumbnail.distanceCm)}; dashed: emitting area
            </p>
          ) : null}
        </div>
        <div className="min-w-0 space-y-2">
          <p className="bl-label">
            {categoryLabel(report.category)} · {report.maker}
            {report.units > 1 ? ` · ${report.units} units` : ''}
          </p>
          <h3 id={headingId} className="text-lg leading-snug font-semibold">
            <Link to={`/reports/${report.slug}`}>{report.title}</Link>
          </h3>
          <p className="text-ink-soft">{report.summary}</p>
          <p className="font-sans text-xs text-ink-muted">
            {report.version > 1 ? (
              <>
                Version {report.version}, corrected <time dateTime={report.publishedAt}>{formatDate(report.publishedAt)}</time> · first
                published <time dateTime={report.firstPublishedAt}>{formatDate(report.firstPublishedAt)}</time>
              </>
            ) : (
              <>
                Published <time dateTime={report.publishedAt}>{formatDate(report.publishedAt)}</time>
              </>
            )}
          </p>
          <dl className="grid grid-cols-2 gap-x-6 gap-y-2 pt-1 font-sans text-sm md:grid-cols-4">
            {CARD_FIGURES.map((id) => {
              const def = KEY_FIGURES.find((f) => f.id === id)!;
              const text = def.text(report.keyFigures, units);
              return (
                <div key={id}>
                  <dt className="text-xs text-ink-soft">{def.heading(units)}</dt>
                  <dd className="font-semibold tabular-nums">{text ?? <EmptyFigure meaning={def.empty} />}</dd>
                </div>
              );
            })}
          </dl>
        </div>
      </article>
    </li>
  );
}

/** The home page's newest reports, each with a small coverage picture and its key figures. */
export function LatestReports() {
  const reports = usePublicReports();
  return (
    <section aria-labelledby="latest-reports" className="space-y-4">
      <div className="flex flex-wrap items-baseline justify-between gap-3">
        <h2 id="latest-reports" className="text-xl font-semibold">
          Latest reports
        </h2>
        {reports.data && reports.data.length > 0 ? (
          <Link to="/reports" className="font-sans text-sm font-semibold">
            All {reports.data.length} reports, as a table you can sort
          </Link>
        ) : null}
      </div>
      {reports.isPending ? (
        <Spinner label="Loading the latest reports…" />
      ) : reports.isError ? (
        <ErrorState inline title="The reports could not be loaded" error={reports.error} onRetry={() => void reports.refetch()} />
      ) : reports.data.length === 0 ? (
        <div className="rounded-md border border-dashed border-rule-strong bg-paper-raised px-6 py-8 text-center">
          <p className="text-lg font-semibold">No reports published yet</p>
          <p className="mt-1 text-ink-soft">
            The first units are on the bench. <Link to="/subscribe">Get an e-mail</Link> when a report is out, or{' '}
            <Link to="/request">ask us to test a device</Link>.
          </p>
        </div>
      ) : (
        <ul className="space-y-4">
          {reports.data.slice(0, LATEST).map((r) => (
            <ReportCard key={r.slug} report={r} />
          ))}
        </ul>
      )}
    </section>
  );
}
