import type { ReactNode } from 'react';
import { cn } from '#src/lib/cn.ts';

/**
 * A wide table's frame: scrolls sideways on a narrow screen, and takes focus so a keyboard user
 * can scroll it too (a scrollable region must be reachable without a mouse).
 */
export function ScrollRegion({ label, children, className }: { label: string; children: ReactNode; className?: string }) {
  return (
    <div role="region" aria-label={label} tabIndex={0} className={cn('overflow-x-auto', className)}>
      {children}
    </div>
  );
}
