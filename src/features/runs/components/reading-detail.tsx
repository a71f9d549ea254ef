import { lazy, Suspense, useId, useState } from 'react';
import type { Reading } from '#shared/schemas/runs.ts';
import { Button } from '#src/components/button.tsx';
import { IssueList } from '#src/components/issue-list.tsx';
import { TextField } from '#src/components/text-field.tsx';
import { isApiError } from '#src/lib/api-client.ts';
import { formatBytes, formatDate, formatFigure, formatLength } from '#src/lib/format.ts';
import { useReadingSpectrum } from '../api/get-spectrum.ts';
import { useExcludeReading } from '../api/run-actions.ts';

// The chart library loads with the first spectrum a reader opens.
const SpectrumChart = lazy(() => import('#src/components/figures/spectrum-chart.tsx').then((m) => ({ default: m.SpectrumChart })));

export function readingName(r: Pick<Reading, 'distanceCm' | 'xCm' | 'yCm' | 'slot'>): string {
  const where = `${formatLength(r.distanceCm)} cm, x ${formatLength(r.xCm)}, y ${formatLength(r.yCm)}`;
  return r.slot === 'grid' ? where : `${where} (${r.slot === 'center_start' ? 'start' : 'end'} centre reading)`;
}

/** One reading: its file and what the importer found, its history, its spectrum, and exclusion. */
export function ReadingDetail({ runId, reading, editable }: { runId: string; reading: Reading; editable: boolean }) {
  const headingId = useId();
  const spectrum = useReadingSpectrum(runId, reading.state === 'analysed' ? reading.id : null);
  const exclude = useExcludeReading(runId);
  const [reason, setReason] = useState('');
  const [error, setError] = useState<string | undefined>();
  const values = Object.entries(reading.values).filter(([, v]) => v !== null);

  return (
    <section aria-labelledby={headingId} className="space-y-4 rounded-md border border-rule bg-paper-raised px-5 py-4">
      <h3 id={headingId} className="text-lg font-semibold">
        Reading at {readingName(reading)}
      </h3>
      <p className="font-sans text-sm">
        State: <span className="font-semibold">{reading.state}</span>
        {reading.excludedReason ? <> — excluded: “{reading.excludedReason}”</> : null}
      </p>
      {values.length ? (
        <p className="font-sans text-sm">
          {values.map(([band, v]) => `${band} ${formatFigure(v as number)} mW/cm²`).join(' · ')}
          {reading.peakNm !== null ? ` · peak at ${formatLength(reading.peakNm)} nm` : ''}
        </p>
      ) : null}
      {reading.file ? (
        <div className="space-y-2">
          <p className="font-sans text-sm">
            File{' '}
            <a className="font-semibold" href={`/api/lab/runs/${encodeURIComponent(runId)}/files/${encodeURIComponent(reading.file.id)}`}>
              {reading.file.originalName}
            </a>{' '}
            ({formatBytes(reading.file.sizeBytes)}), uploaded by {reading.file.uploadedBy} on {formatDate(reading.file.uploadedAt)}; SHA-256{' '}
            <code className="break-all font-mono text-xs">{reading.file.sha256}</code>
          </p>
          <h4 id={`${headingId}-issues`} className="bl-label">
            What the importer found ({reading.file.issues.length})
          </h4>
          <IssueList issues={reading.file.issues} headingId={`${headingId}-issues`} />
        </div>
      ) : (
        <p className="font-sans text-sm text-ink-soft">No file for this point yet.</p>
      )}
      {reading.history.length ? (
        <details>
          <summary className="cursor-pointer font-sans text-sm font-semibold text-signal">Earlier files for this point ({reading.history.length})</summary>
          <ul className="mt-2 space-y-1 font-sans text-xs">
            {reading.history.map((f) => (
              <li key={f.id}>
                <a href={`/api/lab/runs/${encodeURIComponent(runId)}/files/${encodeURIComponent(f.id)}`}>{f.originalName}</a>, {formatDate(f.uploadedAt)},{' '}
                {f.uploadedBy}, {f.state}
              </li>
            ))}
          </ul>
        </details>
      ) : null}
      {spectrum.data ? (
        <Suspense fallback={<p className="h-72 font-sans text-sm text-ink-soft">Drawing the spectrum…</p>}>
          <SpectrumChart
            spectrum={{ wavelengthNm: Float64Array.from(spectrum.data.wavelengthNm), irradianceWm2Nm: Float64Array.from(spectrum.data.irradianceWm2Nm) }}
            fileName={spectrum.data.fileName}
          />
        </Suspense>
      ) : spectrum.isFetching ? (
        <p className="font-sans text-sm text-ink-soft">Loading the spectrum…</p>
      ) : null}
      {editable ? (
        reading.excludedReason === null ? (
          <form
            className="flex flex-wrap items-end gap-3"
            onSubmit={(e) => {
              e.preventDefault();
              if (reason.trim().length < 5) return setError('Give the reason in a few words.');
              setError(undefined);
              exclude.mutate(
                { readingId: reading.id, reason: reason.trim() },
                { onSuccess: () => setReason(''), onError: (err) => setError(isApiError(err) ? err.message : 'Not excluded.') },
              );
            }}
          >
            <TextField label="Exclude this point, because…" value={reason} error={error} onChange={(e) => setReason(e.target.value)} className="min-w-72" />
            <Button type="submit" variant="secondary" pending={exclude.isPending}>
              Exclude
            </Button>
          </form>
        ) : (
          <Button variant="secondary" pending={exclude.isPending} onClick={() => exclude.mutate({ readingId: reading.id, reason: null })}>
            Include it again
          </Button>
        )
      ) : null}
    </section>
  );
}
