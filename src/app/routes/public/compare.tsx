import { PageHeader } from '#src/components/page-header.tsx';
import { CompareView } from '#src/features/public-reports/components/compare-view.tsx';

export default function CompareRoute() {
  return (
    <>
      <PageHeader
        title="Compare"
        description="Published units side by side, on the same scales: their lateral profiles on one chart, their coverage maps on one colour scale, and their key figures in one table."
      />
      <CompareView />
    </>
  );
}
