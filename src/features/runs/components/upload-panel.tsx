import { useQueryClient } from '@tanstack/react-query';
import { useId, useRef, useState } from 'react';
import { UPLOAD_LIMITS } from '#shared/lab/upload-limits.ts';
import type { Run, UploadResult } from '#shared/schemas/runs.ts';
import { Alert } from '#src/components/alert.tsx';
import { Button } from '#src/components/button.tsx';
import { FileDropZone } from '#src/components/file-drop-zone.tsx';
import { isApiError } from '#src/lib/api-client.ts';
import { formatBytes, formatCount } from '#src/lib/format.ts';
import { uploadRunFiles, type UploadProgress } from '../api/upload-files.ts';
import { ProgressBar } from './progress-bar.tsx';

type State =
  | { kind: 'idle' }
  | { kind: 'uploading'; progress: UploadProgress; count: number }
  | { kind: 'done'; result: UploadResult }
  | { kind: 'failed'; message: string; details: string[] };

/**
 * Files for a run: dropped or picked, sent in one batch with a transfer progress bar. The
 * processing that follows (n of N analysed) is shown beside it from the run's own progress.
 */
export function UploadPanel({ run }: { run: Run }) {
  const queryClient = useQueryClient();
  const [files, setFiles] = useState<File[]>([]);
  const [manifest, setManifest] = useState<File | null>(null);
  const [state, setState] = useState<State>({ kind: 'idle' });
  const manifestId = useId();
  const manifestInput = useRef<HTMLInputElement>(null);
  const meter = run.instrument.kind === 'irradiance_meter';
  const totalBytes = files.reduce((s, f) => s + f.size, 0);
  const tooMany = files.length > UPLOAD_LIMITS.files;
  const tooBig = totalBytes > UPLOAD_LIMITS.batchBytes;
  const oversized = files.filter((f) => f.size > UPLOAD_LIMITS.fileBytes);

  const send = async () => {
    setState({ kind: 'uploading', progress: { loadedBytes: 0, totalBytes }, count: files.length });
    try {
      const result = await uploadRunFiles(run.id, files, manifest, (progress) => setState({ kind: 'uploading', progress, count: files.length }));
      setState({ kind: 'done', result });
      setFiles([]);
      setManifest(null);
      if (manifestInput.current) manifestInput.current.value = '';
    } catch (err) {
      const details =
        isApiError(err) && Array.isArray(err.details)
          ? (err.details as { message?: string }[]).map((d) => d.message ?? '').filter(Boolean)
          : [];
      setState({ kind: 'failed', message: isApiError(err) ? err.message : 'The upload failed.', details });
    } finally {
      await queryClient.invalidateQueries({ queryKey: ['lab', 'runs', run.id] });
    }
  };

  const p = run.progress;
  return (
    <section aria-labelledby="upload-heading" className="space-y-4">
      <h2 id="upload-heading" className="text-xl font-semibold">
        Files
      </h2>
      <div className="max-w-measure space-y-2 text-sm text-ink-soft">
        {meter ? (
          <p>
            A meter run takes the lab's meter-readings template, <code className="rounded bg-paper-sunk px-1 font-mono">distance_cm,x_cm,y_cm,irradiance_mw_cm2</code>:
            one file fills every grid point it lists.
          </p>
        ) : (
          <p>
            Each spectrum file fills one grid point, found from its name{' '}
            <code className="rounded bg-paper-sunk px-1 font-mono">d&lt;distance&gt;_x&lt;x&gt;_y&lt;y&gt;.&lt;ext&gt;</code> in cm — for
            example <code className="font-mono">d30_x-10_y0.csv</code> or <code className="font-mono">d15_x7.5_y-5.txt</code>; add{' '}
            <code className="font-mono">_start</code> or <code className="font-mono">_end</code> for the centre readings of the drift
            check — or from a manifest CSV <code className="font-mono">file,distance_cm,x_cm,y_cm</code>. Files that match no point are
            listed and not stored; a file already in the run is recognised and not stored twice; a new file for a filled point
            replaces it and the old one stays in the point's history.
          </p>
        )}
        <p className="font-sans text-xs">
          At most {formatBytes(UPLOAD_LIMITS.fileBytes)} a file, {formatCount(UPLOAD_LIMITS.files)} files and{' '}
          {formatBytes(UPLOAD_LIMITS.batchBytes)} a batch.
        </p>
      </div>

      <FileDropZone label={meter ? 'Meter-readings files' : 'Spectrum files'} hint="Many at once." multiple onFiles={(picked) => setFiles((f) => [...f, ...picked])} />
      {meter ? null : (
        <div>
          <label htmlFor={manifestId} className="block font-sans text-sm font-semibold text-ink">
            Manifest (optional)
          </label>
          <input
            id={manifestId}
            ref={manifestInput}
            type="file"
            accept=".csv,text/csv"
            onChange={(e) => setManifest(e.target.files?.[0] ?? null)}
            className="mt-1 block font-sans text-sm text-ink-soft file:mr-3 file:min-h-9 file:rounded file:border file:border-control file:bg-paper-raised file:px-3 file:font-semibold"
          />
        </div>
      )}

      <div className="flex flex-wrap items-center gap-3">
        <Button onClick={() => void send()} disabled={files.length === 0 || tooMany || tooBig || oversized.length > 0} pending={state.kind === 'uploading'}>
          Upload {files.length > 0 ? `${formatCount(files.length)} ${files.length === 1 ? 'file' : 'files'} (${formatBytes(totalBytes)})` : 'files'}
        </Button>
        {files.length > 0 && state.kind !== 'uploading' ? (
          <Button variant="quiet" onClick={() => setFiles([])}>
            Clear the choice
          </Button>
        ) : null}
      </div>
      {tooMany || tooBig || oversized.length > 0 ? (
        <Alert tone="error">
          {oversized.length > 0
            ? `${oversized.map((f) => f.name).join(', ')} ${oversized.length === 1 ? 'is' : 'are'} larger than ${formatBytes(UPLOAD_LIMITS.fileBytes)}.`
            : `Split the batch: at most ${formatCount(UPLOAD_LIMITS.files)} files and ${formatBytes(UPLOAD_LIMITS.batchBytes)} at once.`}
        </Alert>
      ) : null}

      <div className="space-y-3" aria-live="polite">
        {state.kind === 'uploading' ? (
          <ProgressBar
            label="Transfer"
            value={state.progress.loadedBytes}
            max={state.progress.totalBytes || 1}
            detail={`${formatBytes(state.progress.loadedBytes)} of ${formatBytes(state.progress.totalBytes)} sent`}
          />
        ) : null}
        <ProgressBar
          label="Analysis"
          value={p.analysed + p.failed}
          max={p.expected}
          detail={`${formatCount(p.analysed)} of ${formatCount(p.expected)} analysed${p.failed ? `, ${formatCount(p.failed)} failed` : ''}${p.excluded ? `, ${formatCount(p.excluded)} excluded` : ''}${p.analysing ? ' — updating the figures…' : ''}`}
        />
        {state.kind === 'done' ? <UploadOutcome result={state.result} /> : null}
        {state.kind === 'failed' ? (
          <Alert tone="error" title="Nothing was stored">
            <p>{state.message}</p>
            {state.details.length ? (
              <ul className="mt-2 list-disc pl-5">
                {state.details.map((d) => (
                  <li key={d}>{d}</li>
                ))}
              </ul>
            ) : null}
          </Alert>
        ) : null}
      </div>
    </section>
  );
}

function UploadOutcome({ result }: { result: UploadResult }) {
  const n = result.accepted.length;
  return (
    <Alert tone={result.unmatched.length ? 'warning' : 'success'} title="Upload received">
      <p>
        {formatCount(n)} {n === 1 ? 'file' : 'files'} stored and queued for analysis.
        {result.duplicates.length ? ` ${formatCount(result.duplicates.length)} already in this run (not stored again).` : ''}
      </p>
      {result.unmatched.length ? (
        <details className="mt-2">
          <summary className="cursor-pointer font-semibold">
            {formatCount(result.unmatched.length)} {result.unmatched.length === 1 ? 'file matches' : 'files match'} no grid point (not stored)
          </summary>
          <ul className="mt-1 list-disc pl-5 font-mono text-xs">
            {result.unmatched.map((u) => (
              <li key={u}>{u}</li>
            ))}
          </ul>
        </details>
      ) : null}
    </Alert>
  );
}
