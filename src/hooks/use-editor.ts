import { useCallback, useEffect, useRef, useState } from 'react';

export type EditorState<T> = { mode: 'closed' } | { mode: 'create' } | { mode: 'edit'; item: T };

/**
 * Which create/edit form is open, if any. When it closes, focus goes back to the control that
 * opened it (the Add button, a row's Edit button) rather than falling to the page.
 */
export function useEditor<T>() {
  const [state, setState] = useState<EditorState<T>>({ mode: 'closed' });
  const opener = useRef<HTMLElement | null>(null);

  useEffect(() => {
    if (state.mode !== 'closed' || !opener.current) return;
    if (opener.current.isConnected) opener.current.focus();
    opener.current = null;
  }, [state]);

  const open = useCallback((next: Exclude<EditorState<T>, { mode: 'closed' }>) => {
    // Some browsers do not focus a clicked button; then there is nothing to go back to.
    const active = document.activeElement;
    opener.current = active instanceof HTMLElement && active !== document.body ? active : null;
    setState(next);
  }, []);
  const openCreate = useCallback(() => open({ mode: 'create' }), [open]);
  const openEdit = useCallback((item: T) => open({ mode: 'edit', item }), [open]);
  const close = useCallback(() => setState({ mode: 'closed' }), []);

  return { state, openCreate, openEdit, close };
}
