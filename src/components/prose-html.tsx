import { cn } from '../lib/cn.ts';

/**
 * Typography for long documents rendered from Markdown: headings with room above, measured line
 * length, lists, inline code, code blocks and tables that scroll sideways inside their own region.
 */
export const proseClasses = cn(
  // Text keeps a readable line length; tables may use the whole column.
  'text-base leading-relaxed text-ink [&>blockquote]:max-w-measure [&>h2]:max-w-measure [&>h3]:max-w-measure [&>ol]:max-w-measure [&>p]:max-w-measure [&>pre]:max-w-measure [&>ul]:max-w-measure',
  '[&_h2]:mt-12 [&_h2]:mb-3 [&_h2]:scroll-mt-6 [&_h2]:border-b [&_h2]:border-rule [&_h2]:pb-1 [&_h2]:text-2xl [&_h2]:font-semibold [&_h2]:tracking-tight',
  '[&_h3]:mt-8 [&_h3]:mb-2 [&_h3]:scroll-mt-6 [&_h3]:text-xl [&_h3]:font-semibold',
  '[&_h4]:mt-6 [&_h4]:mb-2 [&_h4]:font-sans [&_h4]:text-base [&_h4]:font-semibold',
  '[&_p]:my-4 [&_strong]:font-semibold',
  '[&_ul]:my-4 [&_ul]:list-disc [&_ul]:pl-6 [&_ol]:my-4 [&_ol]:list-decimal [&_ol]:pl-6 [&_li]:my-1.5 [&_li]:marker:text-ink-muted',
  '[&_code]:rounded-sm [&_code]:bg-paper-sunk [&_code]:px-1 [&_code]:py-px [&_code]:font-mono [&_code]:text-[0.875em]',
  '[&_pre]:my-5 [&_pre]:overflow-x-auto [&_pre]:rounded [&_pre]:border [&_pre]:border-rule [&_pre]:bg-paper-sunk [&_pre]:p-4 [&_pre]:text-sm [&_pre]:leading-snug',
  '[&_pre_code]:bg-transparent [&_pre_code]:p-0',
  '[&_.bl-doc-table]:my-6 [&_.bl-doc-table]:overflow-x-auto [&_.bl-doc-table]:rounded-md [&_.bl-doc-table]:border [&_.bl-doc-table]:border-rule [&_.bl-doc-table]:bg-paper-raised',
  '[&_table]:w-full [&_table]:border-collapse [&_table]:font-sans [&_table]:text-sm [&_table]:leading-snug',
  '[&_th]:border-b [&_th]:border-rule [&_th]:bg-paper-sunk [&_th]:px-3 [&_th]:py-2 [&_th]:text-left [&_th]:align-bottom [&_th]:font-semibold',
  '[&_td]:border-b [&_td]:border-rule [&_td]:px-3 [&_td]:py-2 [&_td]:align-top',
  '[&_blockquote]:my-4 [&_blockquote]:border-l-4 [&_blockquote]:border-rule-strong [&_blockquote]:pl-4 [&_blockquote]:text-ink-soft',
  '[&_hr]:my-10 [&_hr]:border-rule',
);

/**
 * HTML the server rendered from Markdown and sanitised (no script, event handlers, javascript:
 * URLs or inline styles survive there), set in the prose style.
 */
export function ProseHtml({ html, className }: { html: string; className?: string }) {
  // Sanitised on the server: see server/reports/render-markdown.ts.
  return <div className={cn(proseClasses, className)} dangerouslySetInnerHTML={{ __html: html }} />;
}
