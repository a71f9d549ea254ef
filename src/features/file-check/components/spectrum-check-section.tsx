import { Button } from '#src/components/button.tsx';
import { SelectField } from '#src/components/select-field.tsx';
import { useSpectrumChecks, type SpectrumFileItem } from '../hooks/use-spectrum-checks.ts';
import { SPECTRAL_UNITS } from '../utils/page-checks.ts';
import { prettyUnit } from '#src/lib/format.ts';
import { FileDropZone } from '#src/components/file-drop-zone.tsx';
import { MeasurementCautions } from './measurement-cautions.tsx';
import { SpectrumResultCard } from './spectrum-result-card.tsx';

const UNIT_OPTIONS = [
  { value: '', label: 'None: reject a file without a unit' },
  ...SPECTRAL_UNITS.map((u) => ({ value: u, label: prettyUnit(u) })),
];

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/** One sentence for the live region: what is being read, and how the checks came out. */
function summarize(items: readonly SpectrumFileItem[]): string {
  if (items.length === 0) return '';
  const reading = items.filter((i) => i.file.state === 'reading').length;
  if (reading > 0) return `Reading ${plural(reading, 'file', 'files')}…`;
  const readable = items.filter((i) => i.check?.ok).length;
  const rejected = items.length - readable;
  return `Checked ${plural(items.length, 'spectrum file', 'spectrum files')}: ${readable} readable, ${rejected} rejected.`;
}

export function SpectrumCheckSection() {
  const { checks, add, clear, unitIfMissing, setUnitIfMissing } = useSpectrumChecks();
  const anyFigures = checks.some((c) => c.check?.ok);
  return (
    <section aria-labelledby="spectrum-files-heading" className="space-y-6">
      <div className="max-w-measure">
        <h2 id="spectrum-files-heading" className="text-2xl font-semibold">
          Spectrum exports
        </h2>
        <p className="mt-2 text-ink-soft">
          Spectroradiometer exports, one spectrum per file. Each is read as the upload would read it; its figures and
          any problems appear below.
        </p>
      </div>
      <div className="grid gap-4 md:grid-cols-[2fr_1fr] md:items-start">
        <FileDropZone
          label="Spectrum files"
          multiple
          hint="Comma-, semicolon- or tab-separated text; several at once."
          onFiles={add}
        />
        <SelectField
          label="Unit if the file does not say"
          hint="Used only for files that name no irradiance unit; changing it checks them again."
          options={UNIT_OPTIONS}
          value={unitIfMissing}
          onChange={(event) => setUnitIfMissing(event.target.value)}
        />
      </div>
      <div className="flex flex-wrap items-center justify-between gap-3">
        <p aria-live="polite" className="font-sans text-sm font-semibold text-ink">
          {summarize(checks)}
        </p>
        {checks.length > 0 ? (
          <Button variant="secondary" size="sm" onClick={clear}>
            Clear spectrum results
          </Button>
        ) : null}
      </div>
      {checks.length > 0 ? (
        <div className="space-y-6">
          {anyFigures ? <MeasurementCautions /> : null}
          {checks.map((item) => (
            <SpectrumResultCard key={item.file.key} item={item} />
          ))}
        </div>
      ) : null}
    </section>
  );
}
