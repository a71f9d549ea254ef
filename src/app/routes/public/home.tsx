import { PageHeader } from '#src/components/page-header.tsx';
import { LabStatement } from '#src/features/public-site/components/lab-statement.tsx';
import { LatestReports } from '#src/features/public-site/components/latest-reports.tsx';

export default function HomeRoute() {
  return (
    <>
      <PageHeader
        eyebrow="Independent test lab"
        title="Light-therapy devices, measured on the bench"
        description="What red and near-infrared panels really deliver: across their face, and at the distances people use them."
      />
      <div className="space-y-section">
        <LabStatement />
        <LatestReports />
      </div>
    </>
  );
}
