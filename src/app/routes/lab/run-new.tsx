import { PageHeader } from '#src/components/page-header.tsx';
import { NewRunForm } from '#src/features/runs/components/new-run-form.tsx';

export default function NewRunRoute() {
  const today = new Date().toISOString().slice(0, 10);
  return (
    <>
      <PageHeader
        eyebrow="Lab · Runs"
        title="New run"
        description="One unit, one instrument, one grid of distances and positions. Files are uploaded on the run's page once it exists."
      />
      <NewRunForm today={today} />
    </>
  );
}
