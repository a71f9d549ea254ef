import { lazy, Suspense, useId } from 'react';
import { Card } from '#src/components/card.tsx';
import type { SpectrumFileItem } from '../hooks/use-spectrum-checks.ts';
import { formatBytes } from '#src/lib/format.ts';
import { CheckStatus, ReadingNote } from './check-status.tsx';
import { IssueList } from '#src/components/issue-list.tsx';
import { EmissionPeaksTable, SpectrumFigures, UnitLine } from './spectrum-figures.tsx';

// The chart library is most of this page's code: it loads with the first readable spectrum.
const SpectrumChart = lazy(() => import('#src/components/figures/spectrum-chart.tsx').then((m) => ({ default: m.SpectrumChart })));

function Title({ name, sizeBytes, ok }: { name: string; sizeBytes: number; ok: boolean | null }) {
  return (
    <span className="flex flex-wrap items-center gap-x-3 gap-y-1">
      <span className="break-all">{name}</span>
      <span className="font-sans text-xs font-normal text-ink-muted">{formatBytes(sizeBytes)}</span>
      {ok === null ? null : <CheckStatus ok={ok} />}
    </span>
  );
}

/** One spectrum file: readable or not, its figures, its chart and the importer's findings. */
export function SpectrumResultCard({ item }: { item: SpectrumFileItem }) {
  const { file, check } = item;
  const issuesId = useId();
  const figuresId = useId();
  const ok = check ? check.ok : file.state === 'failed' ? false : null;
  const errors = check?.issues.filter((i) => i.severity === 'error').length ?? 0;

  return (
    <Card titleAs="h3" title={<Title name={file.name} sizeBytes={file.sizeBytes} ok={ok} />}>
      {file.state === 'reading' ? <ReadingNote /> : null}
      {file.state === 'failed' ? <p className="font-sans text-sm font-semibold text-danger">{file.failure}</p> : null}
      {check ? (
        <div className="space-y-6">
          {check.ok && check.result?.spectrum && check.summary ? (
            <>
              <SpectrumFigures check={check} summary={check.summary} captionId={figuresId} fileName={file.name} />
              <section>
                <h4 className="bl-label mb-2">Emission peaks</h4>
                <EmissionPeaksTable summary={check.summary} fileName={file.name} />
              </section>
              <section>
                <h4 className="bl-label mb-2">Spectrum</h4>
                <Suspense fallback={<p className="h-72 font-sans text-sm text-ink-soft">Drawing the chart…</p>}>
                  <SpectrumChart spectrum={check.result.spectrum} fileName={file.name} />
                </Suspense>
              </section>
            </>
          ) : (
            <p className="font-sans text-sm text-ink">
              <span className="font-semibold text-danger">
                This file would be refused: {errors === 1 ? 'one error' : `${errors} errors`} below.
              </span>{' '}
              Unit: <UnitLine check={check} />
            </p>
          )}
          {check.issues.some((i) => i.code === 'no_unit') ? (
            <p className="font-sans text-sm text-ink">
              Here, pick the unit under <span className="font-semibold">Unit if the file does not say</span> above.
            </p>
          ) : null}
          <section>
            <h4 id={issuesId} className="bl-label mb-2">
              Problems found ({check.issues.length})
            </h4>
            <IssueList issues={check.issues} headingId={issuesId} />
          </section>
        </div>
      ) : null}
    </Card>
  );
}
