import { useId, useState, type FormEvent, type ReactNode } from 'react';
import { TEST_REQUEST_STATUS_LABELS, triageBodySchema, type LabTestRequest } from '#shared/schemas/test-requests.ts';
import { Alert } from '#src/components/alert.tsx';
import { Button } from '#src/components/button.tsx';
import { SaveError } from '#src/components/save-error.tsx';
import { SelectField } from '#src/components/select-field.tsx';
import { TextAreaField } from '#src/components/text-area-field.tsx';
import { formatCount, formatDate } from '#src/lib/format.ts';
import { plainIssueMessage } from '#src/lib/form-messages.ts';
import { useMergeTestRequest, useTriageTestRequest } from '../api/lab-test-requests.ts';

type Decision = 'open' | 'planned' | 'declined' | 'tested';
const DECISIONS: { value: Decision; label: string }[] = [
  { value: 'open', label: 'Open' },
  { value: 'planned', label: 'Planned' },
  { value: 'declined', label: 'Declined (with a reason)' },
  { value: 'tested', label: 'Tested (with the report)' },
];

/**
 * One request for an editor: its votes, and the decision (with a reason or the report), or a
 * merge; `children` is what the page adds (the funding and its goal).
 */
export function TriageCard({ request, others, reports, children }: { request: LabTestRequest; others: readonly LabTestRequest[]; reports: readonly { id: string; label: string }[]; children?: ReactNode }) {
  const triage = useTriageTestRequest();
  const merge = useMergeTestRequest();
  const headingId = useId();
  const initial: Decision = request.status === 'planned' || request.status === 'declined' || request.status === 'tested' ? request.status : 'open';
  const [decision, setDecision] = useState<Decision>(initial);
  const [reason, setReason] = useState(request.declineReason ?? '');
  const [reportId, setReportId] = useState(request.reportId ?? '');
  const [intoId, setIntoId] = useState('');
  const [error, setError] = useState<string | undefined>();
  // Known when the decision is sent: the answer may come after the refunds are already done.
  const [refunding, setRefunding] = useState(false);
  const device = `${request.maker} ${request.model}`;

  const onSave = (e: FormEvent) => {
    e.preventDefault();
    const parsed = triageBodySchema.safeParse(decision === 'declined' ? { status: decision, reason } : decision === 'tested' ? { status: decision, reportId } : { status: decision }, { error: plainIssueMessage });
    if (!parsed.success) {
      setError(parsed.error.issues[0]?.message);
      return;
    }
    setError(undefined);
    setRefunding(parsed.data.status === 'declined' && request.status !== 'declined' && request.funding.backers > 0);
    triage.mutate({ id: request.id, body: parsed.data });
  };

  return (
    <article aria-labelledby={headingId} className="rounded-md border border-rule bg-paper-raised px-5 py-4 shadow-sheet">
      <div className="flex flex-wrap items-baseline justify-between gap-3">
        <h3 id={headingId} className="text-lg font-semibold">
          {device}
        </h3>
        <p className="font-sans text-sm">
          <strong>{formatCount(request.votes)}</strong> confirmed {request.votes === 1 ? 'vote' : 'votes'} · {formatCount(request.pendingVotes)} waiting · {formatCount(request.notifyVotes)} to notify ·{' '}
          <span className="bl-label">{TEST_REQUEST_STATUS_LABELS[request.status]}</span>
        </p>
      </div>
      <p className="mt-2 text-ink-soft">{request.reason}</p>
      <p className="mt-1 font-sans text-xs text-ink-muted">
        Asked {formatDate(request.createdAt)} ·{' '}
        <a href={request.link} rel="noopener noreferrer nofollow">
          {request.link}
        </a>
        {request.triagedBy && request.triagedAt ? ` · last decision by ${request.triagedBy}, ${formatDate(request.triagedAt)}` : ''}
      </p>
      {children ? <div className="mt-4 border-t border-rule pt-4">{children}</div> : null}
      {request.status === 'merged' || request.status === 'unconfirmed' ? null : (
        <div className="mt-4 grid gap-6 lg:grid-cols-2">
          <form onSubmit={onSave} noValidate className="space-y-3" aria-label={`Decision on the ${device}`}>
            {triage.isSuccess ? (
              <Alert tone="success">
                Saved
                {triage.data.status === 'tested' && triage.data.report
                  ? '. Voters and backers who asked are e-mailed once the report is published.'
                  : triage.data.status === 'declined' && refunding
                    ? '. Every paid pledge is being refunded; each backer gets an e-mail.'
                    : '.'}
              </Alert>
            ) : null}
            <SaveError error={triage.error} what="The decision" />
            <SelectField label="Decision" options={DECISIONS} value={decision} onChange={(e) => setDecision(e.target.value as Decision)} />
            {decision === 'declined' ? <TextAreaField label="Reason readers will see" rows={2} value={reason} onChange={(e) => setReason(e.target.value)} error={error} /> : null}
            {decision === 'declined' && request.status !== 'declined' && request.funding.backers > 0 ? (
              <p className="font-sans text-sm">
                Declining refunds every paid pledge automatically ({formatCount(request.funding.backers)} {request.funding.backers === 1 ? 'backer' : 'backers'}); each backer gets an e-mail.
              </p>
            ) : null}
            {decision === 'tested' ? (
              <SelectField label="Report" options={[{ value: '', label: 'Choose the report…' }, ...reports.map((r) => ({ value: r.id, label: r.label }))]} value={reportId} onChange={(e) => setReportId(e.target.value)} error={error} />
            ) : null}
            <Button type="submit" size="sm" pending={triage.isPending}>
              Save the decision
            </Button>
          </form>
          {others.length > 0 ? (
            <form
              noValidate
              className="space-y-3"
              aria-label={`Merge the ${device}`}
              onSubmit={(e) => {
                e.preventDefault();
                if (intoId) merge.mutate({ id: request.id, intoId });
              }}
            >
              <SaveError error={merge.error} what="The merge" />
              <SelectField
                label="A near-duplicate of"
                hint="Its votes move to the request kept (one per address); this one leaves the list."
                options={[{ value: '', label: 'Choose the request to keep…' }, ...others.map((o) => ({ value: o.id, label: `${o.maker} ${o.model} (${o.votes})` }))]}
                value={intoId}
                onChange={(e) => setIntoId(e.target.value)}
              />
              <Button type="submit" size="sm" variant="secondary" pending={merge.isPending} disabled={!intoId}>
                Merge into it
              </Button>
            </form>
          ) : null}
        </div>
      )}
    </article>
  );
}
