import type { ReactNode } from 'react';
import { cn } from '../lib/cn.ts';

type Tone = 'info' | 'success' | 'warning' | 'error';

const tones: Record<Tone, string> = {
  info: 'border-signal bg-signal-tint',
  success: 'border-ok bg-ok-tint',
  warning: 'border-warn bg-warn-tint',
  error: 'border-danger bg-danger-tint',
};

const marks: Record<Tone, string> = { info: 'Note', success: 'Done', warning: 'Caution', error: 'Problem' };

/**
 * A boxed message. Errors are announced at once (role="alert"); the rest politely (role="status").
 * The tone is said in words, not only in colour.
 */
export function Alert({
  tone = 'info',
  title,
  children,
  className,
  live = true,
}: {
  tone?: Tone;
  title?: string;
  children?: ReactNode;
  className?: string;
  /** Set false for messages present on first render that need no announcement. */
  live?: boolean;
}) {
  const role = live ? (tone === 'error' ? 'alert' : 'status') : undefined;
  return (
    <div role={role} className={cn('rounded border-l-4 px-4 py-3 text-ink', tones[tone], className)}>
      <p className="bl-label mb-1">{marks[tone]}</p>
      {title ? <p className="font-semibold">{title}</p> : null}
      {children ? <div className="text-sm font-sans leading-relaxed">{children}</div> : null}
    </div>
  );
}
