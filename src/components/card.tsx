import type { ReactNode } from 'react';
import { cn } from '../lib/cn.ts';

/** A sheet on the paper: a titled section with a hairline border. */
export function Card({
  title,
  titleAs: Heading = 'h2',
  children,
  className,
  footer,
}: {
  title?: ReactNode;
  titleAs?: 'h2' | 'h3';
  children: ReactNode;
  className?: string;
  footer?: ReactNode;
}) {
  return (
    <section className={cn('rounded-md border border-rule bg-paper-raised shadow-sheet', className)}>
      {title ? (
        <div className="border-b border-rule px-5 py-3">
          <Heading className="text-lg font-semibold">{title}</Heading>
        </div>
      ) : null}
      <div className="px-5 py-4">{children}</div>
      {footer ? <div className="border-t border-rule px-5 py-3">{footer}</div> : null}
    </section>
  );
}
