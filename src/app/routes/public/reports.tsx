import { NotYetBuilt } from '#src/components/not-yet-built.tsx';

export default function ReportsRoute() {
  return (
    <NotYetBuilt
      title="Reports"
      willHold="every published report, one per model, with its version history, coverage maps at each distance, and the measured data to download."
    />
  );
}
