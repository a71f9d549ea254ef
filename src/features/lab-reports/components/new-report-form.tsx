import { zodResolver } from '@hookform/resolvers/zod';
import { useMemo, useState } from 'react';
import { useController, useForm } from 'react-hook-form';
import { useNavigate } from 'react-router-dom';
import type { z } from 'zod';
import { reportBodySchema } from '#shared/schemas/reports.ts';
import { Button } from '#src/components/button.tsx';
import { SaveError } from '#src/components/save-error.tsx';
import { TextAreaField } from '#src/components/text-area-field.tsx';
import { TextField } from '#src/components/text-field.tsx';
import { formSchema } from '#src/lib/form-schema.ts';
import { plainIssueMessage } from '#src/lib/form-messages.ts';
import { setServerErrors } from '#src/lib/server-field-errors.ts';
import { useCreateReport } from '../api/create-report.ts';
import { groupRunsByModel, type ApprovedRun } from '../utils/run-groups.ts';
import { MarkdownHint } from './markdown-hint.tsx';
import { RunChooser } from './run-chooser.tsx';

export interface NewReportValues {
  runIds: string[];
  title: string;
  summary: string;
  bodyMarkdown: string;
}

const FIELDS: readonly string[] = ['runIds', 'title', 'summary', 'bodyMarkdown'];

/** A new report as a draft: approved runs of one model, a title, a summary and the write-up in Markdown. */
export function NewReportForm({ runs }: { runs: readonly ApprovedRun[] }) {
  const navigate = useNavigate();
  const create = useCreateReport();
  const [failure, setFailure] = useState<unknown>(null);
  const groups = useMemo(() => groupRunsByModel(runs), [runs]);
  // The shared schema checks the body; the one-model rule is checked here first, as the server does.
  const resolver = useMemo(
    () =>
      zodResolver(
        formSchema(reportBodySchema, (values: NewReportValues, addIssue) => {
          const models = new Set(values.runIds.map((id) => runs.find((r) => r.id === id)?.unit.modelId));
          if (models.size > 1) addIssue('runIds', 'A report covers runs of one model only: choose runs from one group.');
          return values;
        }),
        { error: plainIssueMessage },
      ),
    [runs],
  );
  const {
    register,
    control,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<NewReportValues, unknown, z.output<typeof reportBodySchema>>({
    resolver,
    defaultValues: { runIds: [], title: '', summary: '', bodyMarkdown: '' },
  });
  const runIds = useController({ control, name: 'runIds' });

  const onSubmit = handleSubmit((body) => {
    setFailure(null);
    create.mutate(body, {
      onSuccess: (report) => navigate(`/lab/reports/${report.id}`, { state: { created: true } }),
      onError: (error) => {
        if (!setServerErrors(error, setError, (f) => FIELDS.includes(f))) setFailure(error);
      },
    });
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby="new-report-heading" className="space-y-6">
      <SaveError error={failure} what="The report" />
      <RunChooser
        groups={groups}
        value={runIds.field.value}
        onChange={runIds.field.onChange}
        error={errors.runIds?.message}
        firstRef={runIds.field.ref}
      />
      <TextField label="Title" autoComplete="off" error={errors.title?.message} {...register('title')} />
      <TextAreaField label="Summary" hint="A sentence or two: shown on the home page and in the index." rows={3} error={errors.summary?.message} {...register('summary')} />
      <TextAreaField
        label="Write-up"
        hint={<MarkdownHint />}
        rows={14}
        className="font-mono text-sm"
        error={errors.bodyMarkdown?.message}
        {...register('bodyMarkdown')}
      />
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" pending={create.isPending}>
          Create the draft
        </Button>
        <p className="font-sans text-xs text-ink-soft">Nothing is public yet: you can preview the draft before publishing it.</p>
      </div>
    </form>
  );
}
