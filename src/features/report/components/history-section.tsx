import { useState } from 'react';
import { Link } from 'react-router-dom';
import type { PublicReport } from '#shared/schemas/reports.ts';
import { Button } from '#src/components/button.tsx';
import { formatDate } from '#src/lib/format.ts';
import { figuresJsonUrl, readingsCsvUrl, reportPath } from '../utils/report-urls.ts';
import { ReportSection } from './report-section.tsx';

function CopyCitation({ text }: { text: string }) {
  const [state, setState] = useState<'idle' | 'copied' | 'failed'>('idle');
  const copy = async () => {
    try {
      await navigator.clipboard.writeText(text);
      setState('copied');
    } catch {
      setState('failed');
    }
  };
  return (
    <div className="flex flex-wrap items-center gap-3">
      <Button variant="secondary" size="sm" onClick={() => void copy()}>
        Copy the citation
      </Button>
      <span aria-live="polite" className="font-sans text-xs text-ink-soft">
        {state === 'copied' ? 'Copied.' : state === 'failed' ? 'Could not copy: select the text instead.' : ''}
      </span>
    </div>
  );
}

/** Every version at its own address, the downloads at stable addresses, and how to cite this version. */
export function HistorySection({ report }: { report: PublicReport }) {
  const preview = report.preview === true;
  const latest = report.version === report.latestVersion;
  return (
    <ReportSection id="history" title="History and data">
      <div className="grid gap-8 lg:grid-cols-2">
        <div className="space-y-3">
          <h3 className="text-xl font-semibold">Versions</h3>
          <ol className="space-y-3">
            {[...report.versions].reverse().map((v) => {
              const current = v.version === report.version;
              const unpublished = preview && current;
              return (
                <li key={v.version} className="border-l-2 border-rule pl-3">
                  <p className="font-sans text-sm">
                    {unpublished ? (
                      <span className="font-semibold">Version {v.version} (this preview, not published)</span>
                    ) : (
                      <Link to={reportPath(report.slug, v.version)} aria-current={current ? 'page' : undefined} className="font-semibold">
                        Version {v.version}
                      </Link>
                    )}
                    {unpublished ? null : <> · published {formatDate(v.publishedAt)}</>}
                    {current && !unpublished ? <span className="text-ink-soft"> · the version on this page</span> : null}
                  </p>
                  <p className="text-sm text-ink-soft">{v.changeNote ?? (v.version === 1 ? 'First publication.' : 'No note.')}</p>
                </li>
              );
            })}
          </ol>
        </div>
        <div className="space-y-6">
          <div className="space-y-3">
            <h3 className="text-xl font-semibold">Download the data</h3>
            {preview ? (
              <p className="font-sans text-sm text-ink-soft">The downloads appear at their stable addresses once the report is published.</p>
            ) : (
              <ul className="space-y-2 font-sans text-sm">
                <li>
                  <a href={readingsCsvUrl(report.slug, report.version)} download>
                    Readings of version {report.version} (CSV)
                  </a>{' '}
                  <span className="text-ink-soft">— every grid reading of every unit, per band, units in the column names</span>
                </li>
                {latest ? (
                  <>
                    <li>
                      <a href={readingsCsvUrl(report.slug, null)} download>
                        Readings of the latest version (CSV)
                      </a>{' '}
                      <span className="text-ink-soft">— this address always gives the newest version</span>
                    </li>
                    <li>
                      <a href={figuresJsonUrl(report.slug)} download>
                        Figures (JSON)
                      </a>{' '}
                      <span className="text-ink-soft">— every figure on this page with its unit, and the citation</span>
                    </li>
                  </>
                ) : (
                  <li>
                    <a href={figuresJsonUrl(report.slug, report.version)} download>
                      Figures of version {report.version} (JSON)
                    </a>{' '}
                    <span className="text-ink-soft">— every figure on this page with its unit, and this version's citation</span>
                  </li>
                )}
              </ul>
            )}
          </div>
          <div className="space-y-3">
            <h3 className="text-xl font-semibold">How to cite this version</h3>
            {report.citation ? (
              <>
                <p className="rounded border border-rule bg-paper-raised px-4 py-3 text-sm">{report.citation}</p>
                <CopyCitation text={report.citation} />
              </>
            ) : (
              <p className="font-sans text-sm text-ink-soft">The citation is given once the report is published.</p>
            )}
          </div>
        </div>
      </div>
    </ReportSection>
  );
}
