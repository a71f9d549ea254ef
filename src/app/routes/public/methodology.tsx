import { NotYetBuilt } from '#src/components/not-yet-built.tsx';

export default function MethodologyRoute() {
  return (
    <NotYetBuilt
      title="Methodology"
      willHold="how we measure: the instruments and their calibration, the grid of positions and distances, how coverage, uniformity and dose times are worked out, and the uncertainty of each figure."
    />
  );
}
