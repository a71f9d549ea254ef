import type { ReactNode } from 'react';

/**
 * The page's one h1, an optional eyebrow above it and a lede below it.
 * Also sets the document title (React 19 hoists <title> into <head>).
 */
export function PageHeader({
  title,
  eyebrow,
  description,
  actions,
}: {
  title: string;
  eyebrow?: string;
  description?: ReactNode;
  actions?: ReactNode;
}) {
  return (
    <div className="mb-8 flex flex-wrap items-end justify-between gap-4 border-b border-rule pb-5">
      <title>{`${title} · Benchlight`}</title>
      <div className="max-w-measure">
        {eyebrow ? <p className="bl-label mb-2">{eyebrow}</p> : null}
        <h1 className="text-3xl font-semibold tracking-tight text-ink">{title}</h1>
        {description ? <div className="mt-3 text-lg text-ink-soft">{description}</div> : null}
      </div>
      {actions ? <div className="flex gap-3">{actions}</div> : null}
    </div>
  );
}
