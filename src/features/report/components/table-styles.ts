/** Table classes shared by the report's tables (as the figure tables in src/components/figures draw them). */
export const th = 'bl-label border-b border-rule px-3 py-2 text-left align-bottom';
export const thNum = 'bl-label border-b border-rule px-3 py-2 text-right align-bottom';
export const thRow = 'border-b border-rule px-3 py-2 text-left align-top font-sans text-sm font-semibold';
export const td = 'border-b border-rule px-3 py-2 text-sm align-top';
export const tdNum = 'border-b border-rule px-3 py-2 text-right align-top font-sans text-sm tabular-nums whitespace-nowrap';
export const caption = 'pb-2 text-left font-sans text-sm font-semibold text-ink';
