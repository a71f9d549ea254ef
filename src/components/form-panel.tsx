import { useEffect, useId, useRef, type ReactNode } from 'react';

/**
 * A create or edit form shown in place: its heading takes the focus when it opens, so keyboard
 * and screen-reader users land on it; the form is named by that heading.
 */
export function FormPanel({ title, children }: { title: string; children: (headingId: string) => ReactNode }) {
  const headingId = `h${useId().replace(/:/g, '')}`;
  const heading = useRef<HTMLHeadingElement>(null);
  useEffect(() => heading.current?.focus(), []);
  return (
    <section aria-labelledby={headingId} className="rounded-md border border-rule bg-paper-raised px-5 py-4 shadow-sheet">
      <h3 id={headingId} ref={heading} tabIndex={-1} className="mb-4 text-lg font-semibold">
        {title}
      </h3>
      {children(headingId)}
    </section>
  );
}
