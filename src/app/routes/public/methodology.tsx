import type { QueryClient } from '@tanstack/react-query';
import { ErrorState } from '#src/components/error-state.tsx';
import { PageHeader } from '#src/components/page-header.tsx';
import { Spinner } from '#src/components/spinner.tsx';
import { methodologyQueryOptions, useMethodology } from '#src/features/public-site/api/get-methodology.ts';
import { MethodologyDocument } from '#src/features/public-site/components/methodology-document.tsx';

export const clientLoader = (queryClient: QueryClient) => async () => {
  void queryClient.prefetchQuery(methodologyQueryOptions());
  return null;
};

/** How the lab measures and computes, in full: the same document the code is checked against. */
export default function MethodologyRoute() {
  const doc = useMethodology();
  return (
    <>
      <PageHeader
        title="Methodology"
        description="How we measure and how every figure is worked out: the grid, the instruments and the bands, each formula with its source, what the numbers do not say, and the cautions."
      />
      {doc.isPending ? (
        <Spinner label="Loading the methodology…" />
      ) : doc.isError ? (
        <ErrorState inline title="The methodology could not be loaded" error={doc.error} onRetry={() => void doc.refetch()} />
      ) : (
        <MethodologyDocument html={doc.data} />
      )}
    </>
  );
}
