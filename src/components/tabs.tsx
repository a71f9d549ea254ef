import { useId, useRef, type KeyboardEvent, type ReactNode } from 'react';
import { cn } from '../lib/cn.ts';

export interface TabItem<T extends string> {
  id: T;
  label: string;
}

/**
 * Tabs with manual activation: arrow keys, Home and End move between tabs, Enter or Space (or a
 * click) opens one. Only the open tab's panel is rendered. The choice is the caller's state
 * (the URL, usually), so the back button walks through it.
 */
export function Tabs<T extends string>({
  label,
  tabs,
  selected,
  onSelect,
  children,
}: {
  label: string;
  tabs: readonly TabItem<T>[];
  selected: T;
  onSelect: (id: T) => void;
  children: ReactNode;
}) {
  const base = `t${useId().replace(/:/g, '')}`;
  const refs = useRef(new Map<T, HTMLButtonElement>());

  const onKeyDown = (event: KeyboardEvent<HTMLButtonElement>, index: number) => {
    const last = tabs.length - 1;
    const to =
      event.key === 'ArrowRight' ? (index === last ? 0 : index + 1)
      : event.key === 'ArrowLeft' ? (index === 0 ? last : index - 1)
      : event.key === 'Home' ? 0
      : event.key === 'End' ? last
      : null;
    if (to === null) return;
    event.preventDefault();
    refs.current.get(tabs[to].id)?.focus();
  };

  return (
    <div>
      <div role="tablist" aria-label={label} className="flex flex-wrap gap-1 border-b border-rule font-sans text-sm">
        {tabs.map((tab, index) => {
          const isSelected = tab.id === selected;
          return (
            <button
              key={tab.id}
              ref={(el) => {
                if (el) refs.current.set(tab.id, el);
                else refs.current.delete(tab.id);
              }}
              type="button"
              role="tab"
              id={`${base}-${tab.id}`}
              aria-selected={isSelected}
              aria-controls={isSelected ? `${base}-panel` : undefined}
              tabIndex={isSelected ? 0 : -1}
              onClick={() => (isSelected ? undefined : onSelect(tab.id))}
              onKeyDown={(event) => onKeyDown(event, index)}
              className={cn(
                '-mb-px min-h-11 border-b-3 px-4 py-2 font-semibold',
                isSelected ? 'border-signal text-ink' : 'border-transparent text-ink-soft hover:text-ink',
              )}
            >
              {tab.label}
            </button>
          );
        })}
      </div>
      <div role="tabpanel" id={`${base}-panel`} aria-labelledby={`${base}-${selected}`} className="pt-6">
        {children}
      </div>
    </div>
  );
}
