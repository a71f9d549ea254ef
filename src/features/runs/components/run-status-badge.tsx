import { RUN_STATUS_LABELS, type RunStatus } from '#shared/lab/run-workflow.ts';
import { cn } from '#src/lib/cn.ts';

const TONE: Record<RunStatus, string> = {
  draft: 'border-rule-strong bg-paper-sunk text-ink-soft',
  submitted: 'border-signal bg-signal-tint text-signal-strong',
  changes_requested: 'border-warn bg-warn-tint text-warn',
  approved: 'border-ok bg-ok-tint text-ok',
  published: 'border-ok bg-ok-tint text-ok',
};

/** A run's state in words (the colour only repeats it). */
export function RunStatusBadge({ status }: { status: RunStatus }) {
  return (
    <span className={cn('inline-block rounded-full border px-2.5 py-0.5 font-sans text-xs font-semibold', TONE[status])}>
      {RUN_STATUS_LABELS[status]}
    </span>
  );
}
