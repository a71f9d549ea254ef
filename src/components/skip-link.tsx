/** First focusable element of each shell: jumps past the header to the main landmark. */
export function SkipLink({ target = 'main' }: { target?: string }) {
  return (
    <a
      href={`#${target}`}
      className="sr-only rounded bg-ink px-4 py-2 font-sans text-sm font-semibold text-paper no-underline focus:not-sr-only focus:absolute focus:left-4 focus:top-4 focus:z-50 hover:text-paper"
    >
      Skip to main content
    </a>
  );
}
