/** First focusable element of each shell: jumps past the header to the main landmark. */
export function SkipLink({ target = 'main' }: { target?: string }) {
  return (
    <a
      href={`#${target}`}
      className="sr-only rounded bg-ink font-sans text-sm font-semibold text-paper no-underline focus:not-sr-only focus:absolute focus:px-4 focus:py-2 focus:left-4 focus:top-4 focus:z-50 hover:text-paper"
    >
      Skip to main content
    </a>
  );
}
