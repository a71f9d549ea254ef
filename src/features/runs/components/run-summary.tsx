import type { Run } from '#shared/schemas/runs.ts';
import { INSTRUMENT_KIND_LABELS } from '#shared/schemas/instruments.ts';
import { formatDate, formatLength } from '#src/lib/format.ts';

function Item({ label, children }: { label: string; children: React.ReactNode }) {
  return (
    <div>
      <dt className="bl-label">{label}</dt>
      <dd className="mt-0.5 text-sm text-ink">{children}</dd>
    </div>
  );
}

/** Who and what was measured, with which instrument, on which grid, in which conditions. */
export function RunSummary({ run }: { run: Run }) {
  const c = run.conditions;
  const conditions = [
    c.roomTempC === null ? null : `${formatLength(c.roomTempC)} °C room`,
    c.warmupMinutes === null ? null : `${formatLength(c.warmupMinutes)} min warm-up`,
    c.mainsVoltageV === null ? null : `${formatLength(c.mainsVoltageV)} V mains`,
  ].filter(Boolean);
  const g = run.grid;
  return (
    <dl className="grid gap-x-8 gap-y-4 sm:grid-cols-2 lg:grid-cols-3">
      <Item label="Unit">
        {run.unit.makerName} {run.unit.modelName}, serial {run.unit.serial}
        <span className="block font-sans text-xs text-ink-muted">
          Emitting area {formatLength(run.unit.emittingAreaCm.width)} × {formatLength(run.unit.emittingAreaCm.height)} cm
        </span>
      </Item>
      <Item label="Instrument">
        {run.instrument.name} ({INSTRUMENT_KIND_LABELS[run.instrument.kind]}), serial {run.instrument.serial}
        <span className="block font-sans text-xs text-ink-muted">
          Calibrated {formatDate(run.instrument.calibratedOn)}, due {formatDate(run.instrument.calibrationDueOn)}, ±
          {formatLength(run.instrument.calibrationUncertaintyPct)} %
        </span>
        {run.instrument.calibrationOverdue ? (
          <span className="mt-1 block font-sans text-xs font-semibold text-danger">Warning: calibration overdue.</span>
        ) : null}
      </Item>
      <Item label="Measured">
        by {run.measuredBy.displayName} on {formatDate(run.measuredOn)}
        {conditions.length ? <span className="block font-sans text-xs text-ink-muted">{conditions.join(', ')}</span> : null}
      </Item>
      <Item label="Grid">
        {g.distancesCm.map(formatLength).join(', ')} cm × {g.xCm.length} x × {g.yCm.length} y positions
        <span className="block font-sans text-xs text-ink-muted">
          x {formatLength(Math.min(...g.xCm))} to {formatLength(Math.max(...g.xCm))} cm, y {formatLength(Math.min(...g.yCm))} to{' '}
          {formatLength(Math.max(...g.yCm))} cm{run.centerChecks ? '; centre readings at the start and end of each plane' : ''}
        </span>
      </Item>
      <Item label="Bands">
        {Object.entries(run.bands)
          .sort(([, a], [, b]) => a.loNm - b.loNm)
          .map(([name, b]) => `${name} ${formatLength(b.loNm)}–${formatLength(b.hiNm)} nm`)
          .join(', ')}
        <span className="block font-sans text-xs text-ink-muted">“combined” is their union (a working convention, not a standard)</span>
      </Item>
      {run.notes ? <Item label="Notes">{run.notes}</Item> : null}
    </dl>
  );
}
