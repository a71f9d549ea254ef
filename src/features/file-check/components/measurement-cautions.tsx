import { Cautions } from '#src/components/cautions.tsx';

/** Goes beside every block of figures on this page: irradiance is never shown without the cautions. */
export function MeasurementCautions() {
  return (
    <div className="space-y-3">
      <p className="font-sans text-sm font-semibold text-ink">
        These are measurements of a device, not treatment advice.
      </p>
      <Cautions headingLevel={3} title="Cautions for these figures" />
    </div>
  );
}
