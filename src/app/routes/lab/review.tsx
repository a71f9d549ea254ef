import { NotYetBuilt } from '#src/components/not-yet-built.tsx';
import { RequireCapability } from '#src/app/require-capability.tsx';

export default function ReviewRoute() {
  return (
    <RequireCapability capability="runs.review" action="review runs">
      <NotYetBuilt
        eyebrow="Lab"
        title="Review"
        backTo="/lab"
        backLabel="Back to lab home"
        willHold="runs submitted for review: check the readings, the numbers and the write-up, then request changes or approve. A run you measured goes to another editor."
      />
    </RequireCapability>
  );
}
