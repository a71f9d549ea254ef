import { NotYetBuilt } from '#src/components/not-yet-built.tsx';

export default function CompareRoute() {
  return (
    <NotYetBuilt
      title="Compare"
      willHold="published units side by side: irradiance per band at each distance, coverage, uniformity, falloff and the session time to reach a chosen dose."
    />
  );
}
