import { useState } from 'react';
import { Button } from '#src/components/button.tsx';
import { Card } from '#src/components/card.tsx';
import { TextField } from '#src/components/text-field.tsx';
import { useMeterCheck } from '../hooks/use-meter-check.ts';
import type { MeterReadingsFileCheck } from '#shared/measurement/check/check-meter-readings-file.ts';
import { formatBytes, formatLength } from '#src/lib/format.ts';
import { CheckStatus, ReadingNote } from './check-status.tsx';
import { FalloffSummary } from './falloff-summary.tsx';
import { FileDropZone } from '#src/components/file-drop-zone.tsx';
import { IssueList } from '#src/components/issue-list.tsx';
import { MeasurementCautions } from './measurement-cautions.tsx';
import { SegmentedChoice } from '#src/components/segmented-choice.tsx';
import { PlaneReport } from './plane-report.tsx';

function summarize(state: 'reading' | 'read' | 'failed' | null, check: MeterReadingsFileCheck | null): string {
  if (state === null) return '';
  if (state === 'reading') return 'Reading the meter readings file…';
  if (state === 'failed' || !check) return 'The meter readings file could not be read.';
  if (!check.ok || !check.result) return 'Checked the meter readings file: rejected.';
  const planes = check.planes.map((p) => `${formatLength(p.distanceCm)} cm`).join(', ');
  return `Checked the meter readings file: ${check.result.readings.length} readings on ${check.planes.length} ${check.planes.length === 1 ? 'plane' : 'planes'} (${planes}).`;
}

export function MeterCheckSection() {
  const meter = useMeterCheck();
  const { file, check, footprint } = meter;
  const [picked, setPicked] = useState<number | null>(null);
  const distances = check?.planes.map((p) => p.distanceCm) ?? [];
  // A new file may not hold the plane picked before: fall back to its first (nearest) plane.
  const distance = picked !== null && distances.includes(picked) ? picked : (distances[0] ?? null);
  const index = distance === null ? -1 : distances.indexOf(distance);

  return (
    <section aria-labelledby="meter-heading" className="space-y-6">
      <div className="max-w-measure">
        <h2 id="meter-heading" className="text-2xl font-semibold">
          Meter readings
        </h2>
        <p className="mt-2 text-ink-soft">
          An irradiance meter's readings in the lab's template, one row per grid point of every plane:{' '}
          <code className="rounded bg-paper-sunk px-1.5 py-0.5 font-mono text-sm">distance_cm,x_cm,y_cm,irradiance_mw_cm2</code>.
        </p>
      </div>
      <div className="grid gap-4 md:grid-cols-[2fr_1fr] md:items-start">
        <FileDropZone label="Meter readings file" hint="One file; a new one replaces the last." onFiles={meter.add} />
        <fieldset className="space-y-3">
          <legend className="mb-1 font-sans text-sm font-semibold text-ink">Emitting area (optional)</legend>
          <p className="font-sans text-xs text-ink-muted">
            Width along x and height along y, centred on the grid origin: gives the uniformity over it, from the
            coverage map (area-weighted), and of the readings inside it.
          </p>
          <div className="grid grid-cols-2 gap-3">
            <TextField
              label="W (cm)"
              inputMode="decimal"
              value={meter.footprintText.widthCm}
              error={meter.footprintErrors.widthCm}
              onChange={(e) => meter.setFootprintText((f) => ({ ...f, widthCm: e.target.value }))}
            />
            <TextField
              label="H (cm)"
              inputMode="decimal"
              value={meter.footprintText.heightCm}
              error={meter.footprintErrors.heightCm}
              onChange={(e) => meter.setFootprintText((f) => ({ ...f, heightCm: e.target.value }))}
            />
          </div>
        </fieldset>
      </div>
      <div className="flex flex-wrap items-center justify-between gap-3">
        <p aria-live="polite" className="font-sans text-sm font-semibold text-ink">
          {summarize(file?.state ?? null, check)}
        </p>
        {file ? (
          <Button variant="secondary" size="sm" onClick={meter.clear}>
            Clear meter results
          </Button>
        ) : null}
      </div>

      {file ? (
        <Card
          titleAs="h3"
          title={
            <span className="flex flex-wrap items-center gap-x-3 gap-y-1">
              <span className="break-all">{file.name}</span>
              <span className="font-sans text-xs font-normal text-ink-muted">{formatBytes(file.sizeBytes)}</span>
              {check ? <CheckStatus ok={check.ok} /> : file.state === 'failed' ? <CheckStatus ok={false} /> : null}
            </span>
          }
        >
          {file.state === 'reading' ? <ReadingNote /> : null}
          {file.state === 'failed' ? <p className="font-sans text-sm font-semibold text-danger">{file.failure}</p> : null}
          {check ? (
            <section>
              <h4 id="meter-issues-heading" className="bl-label mb-2">
                Problems found ({check.issues.length})
              </h4>
              <IssueList issues={check.issues} headingId="meter-issues-heading" />
            </section>
          ) : null}
        </Card>
      ) : null}

      {check && check.ok && index >= 0 ? (
        <div className="space-y-8">
          <MeasurementCautions />
          <SegmentedChoice
            legend="Plane (distance from the emitting surface)"
            options={distances.map((d) => ({ value: d, label: `${formatLength(d)} cm` }))}
            value={distance!}
            onChange={setPicked}
          />
          <PlaneReport plane={check.planes[index]} footprint={footprint} />
          <FalloffSummary falloff={check.falloff} planes={check.planes.length} />
        </div>
      ) : null}
    </section>
  );
}
