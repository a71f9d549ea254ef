import { NotYetBuilt } from '#src/components/not-yet-built.tsx';

export default function ReviewRoute() {
  return (
    <>
      <NotYetBuilt
        eyebrow="Lab"
        title="Review"
        backTo="/lab"
        backLabel="Back to lab home"
        willHold="runs submitted for review: check the readings, the numbers and the write-up, then request changes or approve. A run you measured goes to another editor."
      />
    </>
  );
}
