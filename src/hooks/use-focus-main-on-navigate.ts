import { useEffect, useRef } from 'react';
import { useLocation } from 'react-router-dom';

/**
 * After a client-side navigation, move focus to the main landmark so keyboard and screen-reader
 * users start at the new page's content (not on the first render, and not for hash links).
 */
export function useFocusMainOnNavigate(mainId = 'main') {
  const { pathname } = useLocation();
  const first = useRef(true);
  useEffect(() => {
    if (first.current) {
      first.current = false;
      return;
    }
    document.getElementById(mainId)?.focus({ preventScroll: false });
  }, [pathname, mainId]);
}
