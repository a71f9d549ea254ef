import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useRef, useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { retractBodySchema, type LabReport } from '#shared/schemas/reports.ts';
import { Button } from '#src/components/button.tsx';
import { SaveError } from '#src/components/save-error.tsx';
import { TextAreaField } from '#src/components/text-area-field.tsx';
import { plainIssueMessage } from '#src/lib/form-messages.ts';
import { setServerErrors } from '#src/lib/server-field-errors.ts';
import { useRetractReport } from '../api/retract-report.ts';

type RetractValues = z.input<typeof retractBodySchema>;
const resolver = zodResolver(retractBodySchema, { error: plainIssueMessage });

/**
 * Retraction, in two steps: the reason first (checked), then a confirmation naming what happens.
 * The page stays online with a banner and the reason; it leaves the index and the comparisons.
 */
export function RetractForm({ report, onRetracted }: { report: LabReport; onRetracted: (report: LabReport) => void }) {
  const retract = useRetractReport(report.id);
  const [reason, setReason] = useState<string | null>(null);
  const [failure, setFailure] = useState<unknown>(null);
  const question = useRef<HTMLParagraphElement>(null);
  // The button pressed has gone: the question that replaced it takes the focus and is read out.
  useEffect(() => {
    if (reason !== null) question.current?.focus();
  }, [reason]);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<RetractValues, unknown, z.output<typeof retractBodySchema>>({ resolver, defaultValues: { reason: '' } });

  const confirm = () => {
    if (reason === null) return;
    setFailure(null);
    retract.mutate(reason, {
      onSuccess: onRetracted,
      onError: (error) => {
        setReason(null);
        if (!setServerErrors(error, setError, (f) => f === 'reason')) setFailure(error);
      },
    });
  };

  return (
    <div className="space-y-4">
      <SaveError error={failure} what="The retraction" />
      {reason === null ? (
        <form
          onSubmit={handleSubmit((body) => {
            setFailure(null);
            setReason(body.reason);
          })}
          noValidate
          aria-labelledby="retract-heading"
          className="space-y-4"
        >
          <TextAreaField
            label="Reason"
            hint="Readers see it in a banner on the report's page."
            rows={3}
            error={errors.reason?.message}
            {...register('reason')}
          />
          <Button type="submit" variant="danger">
            Retract…
          </Button>
        </form>
      ) : (
        <div role="group" aria-labelledby="retract-confirm" className="space-y-3 rounded-md border border-danger bg-danger-tint px-4 py-3">
          <p id="retract-confirm" ref={question} tabIndex={-1} className="font-sans text-sm">
            <strong>Retract “{report.title}”?</strong> Its page stays at /reports/{report.slug} with a banner giving the reason below; it
            leaves the index and cannot be corrected afterwards.
          </p>
          <blockquote className="border-l-4 border-danger pl-3 font-sans text-sm">{reason}</blockquote>
          <div className="flex flex-wrap gap-3">
            <Button variant="danger" pending={retract.isPending} onClick={confirm}>
              Yes, retract it
            </Button>
            <Button variant="secondary" onClick={() => setReason(null)}>
              Go back
            </Button>
          </div>
        </div>
      )}
    </div>
  );
}
