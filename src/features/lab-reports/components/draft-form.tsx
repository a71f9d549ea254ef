import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { reportBodySchema, type LabReport } from '#shared/schemas/reports.ts';
import { Button } from '#src/components/button.tsx';
import { SaveError } from '#src/components/save-error.tsx';
import { TextAreaField } from '#src/components/text-area-field.tsx';
import { TextField } from '#src/components/text-field.tsx';
import { plainIssueMessage } from '#src/lib/form-messages.ts';
import { setServerErrors } from '#src/lib/server-field-errors.ts';
import { useUpdateReport } from '../api/update-report.ts';
import { MarkdownHint } from './markdown-hint.tsx';

// The draft's text is checked as it will be when created: the shared body schema's own messages.
const draftTextSchema = reportBodySchema.pick({ title: true, summary: true, bodyMarkdown: true });
type DraftText = z.input<typeof draftTextSchema>;
const FIELDS: readonly string[] = ['title', 'summary', 'bodyMarkdown'];
const resolver = zodResolver(draftTextSchema, { error: plainIssueMessage });

/** A draft's title, summary and write-up; saving keeps it a draft. */
export function DraftForm({ report, onSaved }: { report: LabReport; onSaved: (report: LabReport) => void }) {
  const update = useUpdateReport(report.id);
  const [failure, setFailure] = useState<unknown>(null);
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isDirty },
  } = useForm<DraftText, unknown, z.output<typeof draftTextSchema>>({
    resolver,
    defaultValues: { title: report.title, summary: report.summary, bodyMarkdown: report.bodyMarkdown },
  });
  const onSubmit = handleSubmit((changes) => {
    setFailure(null);
    update.mutate(changes, {
      onSuccess: (saved) => {
        reset({ title: saved.title, summary: saved.summary, bodyMarkdown: saved.bodyMarkdown });
        onSaved(saved);
      },
      onError: (error) => {
        if (!setServerErrors(error, setError, (f) => FIELDS.includes(f))) setFailure(error);
      },
    });
  });
  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby="draft-heading" className="space-y-5">
      <SaveError error={failure} what="The draft" />
      <TextField label="Title" autoComplete="off" error={errors.title?.message} {...register('title')} />
      <TextAreaField label="Summary" rows={3} error={errors.summary?.message} {...register('summary')} />
      <TextAreaField label="Write-up" hint={<MarkdownHint />} rows={16} className="font-mono text-sm" error={errors.bodyMarkdown?.message} {...register('bodyMarkdown')} />
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" pending={update.isPending}>
          Save the draft
        </Button>
        {isDirty ? <span className="font-sans text-xs text-warn">Unsaved changes: the preview shows the saved text.</span> : null}
      </div>
    </form>
  );
}
