import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { correctionBodySchema, type LabReport } from '#shared/schemas/reports.ts';
import { Button } from '#src/components/button.tsx';
import { SaveError } from '#src/components/save-error.tsx';
import { TextAreaField } from '#src/components/text-area-field.tsx';
import { TextField } from '#src/components/text-field.tsx';
import { formSchema } from '#src/lib/form-schema.ts';
import { plainIssueMessage } from '#src/lib/form-messages.ts';
import { setServerErrors } from '#src/lib/server-field-errors.ts';
import type { CorrectionBody } from '../api/correct-report.ts';
import { useCorrectReport } from '../api/correct-report.ts';
import { MarkdownHint } from './markdown-hint.tsx';

interface CorrectionValues {
  changeNote: string;
  title: string;
  summary: string;
  bodyMarkdown: string;
}
const FIELDS: readonly string[] = ['changeNote', 'title', 'summary', 'bodyMarkdown'];

/**
 * A correction: version n + 1 goes public at once with a change note readers see, and the earlier
 * versions stay readable. The text starts as published; only what is changed is sent.
 */
export function CorrectionForm({ report, onCorrected }: { report: LabReport; onCorrected: (report: LabReport) => void }) {
  const correct = useCorrectReport(report.id);
  const [failure, setFailure] = useState<unknown>(null);
  const [resolver] = useState(() =>
    zodResolver(
      formSchema(correctionBodySchema, (v: CorrectionValues) => ({
        changeNote: v.changeNote,
        title: v.title.trim() === report.title ? undefined : v.title,
        summary: v.summary.trim() === report.summary ? undefined : v.summary,
        bodyMarkdown: v.bodyMarkdown === report.bodyMarkdown ? undefined : v.bodyMarkdown,
      })),
      { error: plainIssueMessage },
    ),
  );
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors },
  } = useForm<CorrectionValues, unknown, CorrectionBody>({
    resolver,
    defaultValues: { changeNote: '', title: report.title, summary: report.summary, bodyMarkdown: report.bodyMarkdown },
  });
  const onSubmit = handleSubmit((body) => {
    setFailure(null);
    correct.mutate(body, {
      onSuccess: (r) => {
        reset({ changeNote: '', title: r.title, summary: r.summary, bodyMarkdown: r.bodyMarkdown });
        onCorrected(r);
      },
      onError: (error) => {
        if (!setServerErrors(error, setError, (f) => FIELDS.includes(f))) setFailure(error);
      },
    });
  });
  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby="correction-heading" className="space-y-5">
      <SaveError error={failure} what="The correction" />
      <TextAreaField
        label="Change note"
        hint="Shown to readers with the new version: what changed and why."
        rows={3}
        error={errors.changeNote?.message}
        {...register('changeNote')}
      />
      <TextField label="Title" hint="Leave as it is to keep the published title." autoComplete="off" error={errors.title?.message} {...register('title')} />
      <TextAreaField label="Summary" hint="Leave as it is to keep it." rows={3} error={errors.summary?.message} {...register('summary')} />
      <TextAreaField label="Write-up" hint={<MarkdownHint />} rows={14} className="font-mono text-sm" error={errors.bodyMarkdown?.message} {...register('bodyMarkdown')} />
      <Button type="submit" pending={correct.isPending}>
        Publish version {report.version + 1}
      </Button>
    </form>
  );
}
