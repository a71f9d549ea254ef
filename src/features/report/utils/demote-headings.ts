/**
 * Moves every heading of server-rendered, sanitised HTML down `by` levels (h2 → h3 …, at most
 * h6), so a write-up's own headings sit under the page's section heading and the outline stays
 * in order. Only tag names change; attributes and content are kept as they are.
 */
export function demoteHeadings(html: string, by: number): string {
  return html.replace(/<(\/?)h([1-6])(?=[\s>/])/gi, (_m, slash: string, level: string) => `<${slash}h${Math.min(6, Number(level) + by)}`);
}
