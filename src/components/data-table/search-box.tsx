import { useEffect, useId, useRef, useState } from 'react';
import { cn } from '#src/lib/cn.ts';
import { Button } from '../button.tsx';
import { controlClasses } from '../field.tsx';

const DEBOUNCE_MS = 300;

/**
 * A search field that sends what is typed after a short pause (Enter sends at once), so a fast
 * typist causes one request and one history entry, not one per key.
 */
export function SearchBox({
  value,
  onSearch,
  label,
  hint,
}: {
  /** The search in force (from the URL). */
  value: string;
  onSearch: (q: string) => void;
  label: string;
  hint?: string;
}) {
  const id = `s${useId().replace(/:/g, '')}`;
  const [draft, setDraft] = useState(value);
  const timer = useRef<ReturnType<typeof setTimeout> | undefined>(undefined);
  const input = useRef<HTMLInputElement>(null);
  const onSearchRef = useRef(onSearch);
  onSearchRef.current = onSearch;

  // The URL changed without typing (back button, a cleared filter): show what is in force.
  useEffect(() => {
    setDraft((d) => (d.trim() === value ? d : value));
  }, [value]);

  useEffect(() => () => clearTimeout(timer.current), []);

  const send = (text: string) => {
    clearTimeout(timer.current);
    if (text.trim() !== value) onSearchRef.current(text.trim());
  };

  // The Clear button goes away once used: focus goes back to the field, not to the page.
  const clear = () => {
    setDraft('');
    send('');
    input.current?.focus();
  };

  const onChange = (text: string) => {
    setDraft(text);
    clearTimeout(timer.current);
    timer.current = setTimeout(() => send(text), DEBOUNCE_MS);
  };

  return (
    <form
      role="search"
      aria-labelledby={`${id}-label`}
      className="flex min-w-64 flex-1 flex-col gap-1.5"
      onSubmit={(event) => {
        event.preventDefault();
        send(draft);
      }}
    >
      <label id={`${id}-label`} htmlFor={id} className="font-sans text-sm font-semibold text-ink">
        {label}
      </label>
      {hint ? (
        <p id={`${id}-hint`} className="font-sans text-xs text-ink-muted">
          {hint}
        </p>
      ) : null}
      <div className="flex gap-2">
        <input
          ref={input}
          id={id}
          type="search"
          autoComplete="off"
          spellCheck={false}
          aria-describedby={hint ? `${id}-hint` : undefined}
          className={cn(controlClasses, 'border-control')}
          value={draft}
          onChange={(event) => onChange(event.target.value)}
          onKeyDown={(event) => {
            if (event.key === 'Escape' && draft) {
              event.preventDefault();
              clear();
            }
          }}
        />
        {draft ? (
          <Button variant="secondary" aria-label={`Clear: ${label}`} onClick={clear}>
            Clear
          </Button>
        ) : null}
      </div>
    </form>
  );
}
