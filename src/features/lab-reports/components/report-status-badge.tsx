import type { LabReport } from '#shared/schemas/reports.ts';
import { cn } from '#src/lib/cn.ts';

const LABEL: Record<LabReport['status'], string> = { draft: 'Draft', published: 'Published', retracted: 'Retracted' };
const TONE: Record<LabReport['status'], string> = {
  draft: 'border-rule-strong bg-paper-sunk text-ink-soft',
  published: 'border-ok bg-ok-tint text-ok',
  retracted: 'border-danger bg-danger-tint text-danger',
};

/** A report's state in words (the colour only repeats it). */
export function ReportStatusBadge({ status }: { status: LabReport['status'] }) {
  return <span className={cn('inline-block rounded-full border px-2.5 py-0.5 font-sans text-xs font-semibold', TONE[status])}>{LABEL[status]}</span>;
}
