import { Link } from 'react-router-dom';
import type { PublicReport } from '#shared/schemas/reports.ts';
import { formatDate } from '#src/lib/format.ts';
import { reportPath } from '../utils/report-urls.ts';

type Report = Pick<PublicReport, 'slug' | 'version' | 'latestVersion' | 'publishedAt' | 'firstPublishedAt' | 'changeNote' | 'versions' | 'retracted' | 'preview'>;

/** For staff: what they see is not public yet. */
export function PreviewBanner({ version }: { version: number }) {
  return (
    <div role="note" aria-label="Preview" className="rounded-md border-2 border-dashed border-signal bg-signal-tint px-5 py-4">
      <p className="text-xl font-semibold text-signal-strong">Preview — not published</p>
      <p className="mt-1 font-sans text-sm text-ink">
        This is version {version} as the public would see it once published, computed from the draft and its runs as they
        stand now. Readers cannot see this page.
      </p>
    </div>
  );
}

/** A retracted report keeps its page: the banner says when and why, above everything else. */
export function RetractionBanner({ retracted }: { retracted: NonNullable<PublicReport['retracted']> }) {
  return (
    <section aria-labelledby="retraction-heading" className="rounded-md border-2 border-danger bg-danger-tint px-5 py-4">
      <h2 id="retraction-heading" className="text-xl font-semibold text-danger">
        Retracted on {formatDate(retracted.at)}
      </h2>
      <p className="mt-2">
        <span className="font-semibold">Reason: </span>
        {retracted.reason}
      </p>
      <p className="mt-2 font-sans text-sm text-ink-soft">
        The report stays here, as it was published, so that anyone who cited it can see what it said. Do not rely on its
        figures.
      </p>
    </section>
  );
}

/** "Version 2 of 2 · published … · first published …". */
export function VersionLine({ report }: { report: Report }) {
  if (report.preview) {
    return (
      <p className="font-sans text-sm text-ink-soft">
        Would be version {report.version}
        {report.version > 1 ? ` (first published ${formatDate(report.firstPublishedAt)})` : ''} · not published
      </p>
    );
  }
  return (
    <p className="font-sans text-sm text-ink-soft">
      <span className="font-semibold text-ink">
        Version {report.version} of {report.latestVersion}
      </span>{' '}
      · published {formatDate(report.publishedAt)}
      {report.version > 1 || report.firstPublishedAt !== report.publishedAt ? ` · first published ${formatDate(report.firstPublishedAt)}` : ''}
    </p>
  );
}

/** A correction: its note, and the earlier versions, each readable at its own address. */
export function CorrectionBanner({ report }: { report: Report }) {
  if (!report.changeNote || report.version < 2) return null;
  const earlier = report.versions.filter((v) => v.version < report.version);
  return (
    <div className="rounded-md border-l-4 border-warn bg-warn-tint px-4 py-3">
      <p>
        <span className="font-semibold">Corrected: </span>
        {report.changeNote}
      </p>
      {earlier.length > 0 && !report.preview ? (
        <p className="mt-1 font-sans text-sm">
          Earlier {earlier.length === 1 ? 'version' : 'versions'}, as published:{' '}
          {earlier.map((v, i) => (
            <span key={v.version}>
              {i > 0 ? ', ' : ''}
              <Link to={reportPath(report.slug, v.version)}>
                version {v.version} ({formatDate(v.publishedAt)})
              </Link>
            </span>
          ))}
          .
        </p>
      ) : null}
    </div>
  );
}

/** Reading an earlier version: say so, and where the latest is. */
export function EarlierVersionNotice({ report }: { report: Report }) {
  if (report.preview || report.version >= report.latestVersion) return null;
  return (
    <div className="rounded-md border-l-4 border-signal bg-signal-tint px-4 py-3 font-sans text-sm">
      <p>
        You are reading version {report.version}, kept as it was published. The report has since been corrected:{' '}
        <Link to={reportPath(report.slug)}>read the latest version ({report.latestVersion})</Link>.
      </p>
    </div>
  );
}
