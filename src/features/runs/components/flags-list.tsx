import type { RunAnalysis } from '#shared/schemas/runs.ts';
import { Alert } from '#src/components/alert.tsx';

/** The automatic flags of a run: warnings to look at, blocking ones to fix or exclude before submitting. */
export function FlagsList({ flags }: { flags: RunAnalysis['flags'] }) {
  if (flags.length === 0) {
    return <p className="font-sans text-sm text-ink-soft">No flags: no outlier, drift, saturation, calibration or missing-point warning.</p>;
  }
  const blocking = flags.filter((f) => f.severity === 'blocking');
  const warnings = flags.filter((f) => f.severity !== 'blocking');
  return (
    <div className="space-y-3">
      {blocking.length ? (
        <Alert tone="error" title="Before submitting">
          <ul className="list-disc pl-5">
            {blocking.map((f, i) => (
              <li key={`${f.code}-${i}`}>{f.message}</li>
            ))}
          </ul>
        </Alert>
      ) : null}
      {warnings.length ? (
        <Alert tone="warning" title={`${warnings.length} ${warnings.length === 1 ? 'flag' : 'flags'} to look at`}>
          <ul className="list-disc pl-5">
            {warnings.map((f, i) => (
              <li key={`${f.code}-${i}`}>{f.message}</li>
            ))}
          </ul>
        </Alert>
      ) : null}
    </div>
  );
}
