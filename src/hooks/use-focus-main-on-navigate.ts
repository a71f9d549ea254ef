import { useEffect, useRef } from 'react';
import { useLocation } from 'react-router-dom';

/**
 * After a client-side navigation, move focus to the main landmark so keyboard and screen-reader
 * users start at the new page's content. Not on first load (the pathname has not changed; this also
 * holds when StrictMode runs effects twice).
 */
export function useFocusMainOnNavigate(mainId = 'main') {
  const { pathname } = useLocation();
  const previous = useRef(pathname);
  useEffect(() => {
    if (previous.current === pathname) return;
    previous.current = pathname;
    document.getElementById(mainId)?.focus();
  }, [pathname, mainId]);
}
