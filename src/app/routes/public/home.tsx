import type { QueryClient } from '@tanstack/react-query';
import { PageHeader } from '#src/components/page-header.tsx';
import { publicReportsQueryOptions } from '#src/features/public-reports/api/get-public-reports.ts';
import { LatestReports } from '#src/features/public-reports/components/latest-reports.tsx';
import { MeasurementsNote } from '#src/features/public-reports/components/measurements-note.tsx';
import { LabStatement } from '#src/features/public-site/components/lab-statement.tsx';

export const clientLoader = (queryClient: QueryClient) => async () => {
  void queryClient.prefetchQuery(publicReportsQueryOptions());
  return null;
};

export default function HomeRoute() {
  return (
    <>
      <PageHeader
        eyebrow="Independent test lab"
        title="Light-therapy devices, measured on the bench"
        description="What red and near-infrared panels really deliver: across their face, and at the distances people use them."
      />
      <div className="space-y-section">
        <LatestReports />
        <LabStatement />
        <MeasurementsNote />
      </div>
    </>
  );
}
