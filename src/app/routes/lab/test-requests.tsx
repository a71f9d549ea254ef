import { useState } from 'react';
import { TEST_REQUEST_STATUSES, TEST_REQUEST_STATUS_LABELS, type TestRequestStatus } from '#shared/schemas/test-requests.ts';
import { ErrorState } from '#src/components/error-state.tsx';
import { PageHeader } from '#src/components/page-header.tsx';
import { SelectField } from '#src/components/select-field.tsx';
import { Spinner } from '#src/components/spinner.tsx';
import { formatCount } from '#src/lib/format.ts';
import { useLabTestRequests } from '#src/features/test-requests/api/lab-test-requests.ts';
import { useReportOptions } from '#src/features/test-requests/api/get-report-options.ts';
import { TriageCard } from '#src/features/test-requests/components/triage-card.tsx';
import { useFundingSettings } from '#src/features/funding/api/get-funding-settings.ts';
import { FundingProgress } from '#src/features/funding/components/funding-progress.tsx';
import { GoalForm } from '#src/features/funding/components/goal-form.tsx';

const FILTERS = [{ value: '', label: 'All but merged and unconfirmed' }, ...TEST_REQUEST_STATUSES.map((s) => ({ value: s, label: TEST_REQUEST_STATUS_LABELS[s] }))];

export default function TestRequestsRoute() {
  const [status, setStatus] = useState<TestRequestStatus | ''>('');
  const requests = useLabTestRequests(status || undefined);
  const reports = useReportOptions();
  const funding = useFundingSettings();
  const shown = (requests.data ?? []).filter((r) => status || (r.status !== 'merged' && r.status !== 'unconfirmed'));
  const mergeTargets = (requests.data ?? []).filter((r) => r.status !== 'merged' && r.status !== 'unconfirmed');
  return (
    <>
      <PageHeader eyebrow="Lab · Readers" title="Test requests" description="Readers’ requests, most confirmed votes first: set a funding goal, plan, decline with a reason (paid pledges are refunded), mark tested with the report, or merge near-duplicates." />
      <div className="mb-6 max-w-xs">
        <SelectField label="Show" options={FILTERS} value={status} onChange={(e) => setStatus(e.target.value as TestRequestStatus | '')} />
      </div>
      {requests.isPending ? (
        <Spinner label="Loading requests…" />
      ) : requests.isError ? (
        <ErrorState inline title="Requests could not be loaded" error={requests.error} onRetry={() => void requests.refetch()} />
      ) : shown.length === 0 ? (
        <p className="text-ink-soft">No requests here.</p>
      ) : (
        <div className="space-y-4">
          {shown.map((r) => (
            <TriageCard key={r.id} request={r} others={mergeTargets.filter((o) => o.id !== r.id)} reports={reports.data ?? []}>
              {r.status === 'merged' || r.status === 'unconfirmed' ? null : (
                <div className="grid gap-6 lg:grid-cols-2">
                  <div className="space-y-2">
                    <h4 className="font-sans text-sm font-semibold">Funding</h4>
                    <FundingProgress funding={r.funding} compact={!r.funding.goal} />
                    {r.pendingPledges > 0 ? (
                      <p className="font-sans text-xs text-ink-muted">
                        {formatCount(r.pendingPledges)} {r.pendingPledges === 1 ? 'pledge' : 'pledges'} waiting for the payment.
                      </p>
                    ) : null}
                  </div>
                  {funding.data ? <GoalForm request={r} settings={funding.data} /> : null}
                </div>
              )}
            </TriageCard>
          ))}
        </div>
      )}
    </>
  );
}
