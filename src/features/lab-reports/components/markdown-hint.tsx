/** The few Markdown forms a write-up needs, and what publication removes. */
export function MarkdownHint() {
  return (
    <span>
      Markdown: <code>## Heading</code>, <code>**bold**</code>, <code>*italic*</code>, <code>- a list item</code>,{' '}
      <code>[link text](https://…)</code>, tables with <code>| a | b |</code> rows; a blank line starts a new paragraph. Scripts,
      inline styles and <code>javascript:</code> links are removed when the page is built.
    </span>
  );
}
