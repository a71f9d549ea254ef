import { NotYetBuilt } from '#src/components/not-yet-built.tsx';

export default function RunsRoute() {
  return (
    <>
      <NotYetBuilt
        eyebrow="Lab"
        title="Runs"
        backTo="/lab"
        backLabel="Back to lab home"
        willHold="the runs of the lab: create a run for a unit and an instrument, set its grid of distances and positions, upload the exports for each reading, fix problems the importer finds and submit the run for review."
      />
    </>
  );
}
