import { useEffect, useState } from 'react';
import { PRINTING_CLASS } from '../components/plan-card.tsx';

/**
 * Print the plan card: render it, mark <html> so print CSS leaves the rest of the page out, open
 * the browser's print dialogue, and tidy up when the browser says printing is over
 * ('afterprint'). The card is only in the page while printing.
 */
export function usePrintCard() {
  const [printing, setPrinting] = useState(false);
  useEffect(() => {
    if (!printing) return;
    const root = document.documentElement;
    root.classList.add(PRINTING_CLASS);
    const done = () => {
      root.classList.remove(PRINTING_CLASS);
      setPrinting(false);
    };
    window.addEventListener('afterprint', done, { once: true });
    try {
      window.print();
    } catch {
      done();
    }
    return () => {
      window.removeEventListener('afterprint', done);
      root.classList.remove(PRINTING_CLASS);
    };
  }, [printing]);
  // A second press while the dialogue's end went unannounced opens it again.
  return { printing, print: () => (printing ? window.print() : setPrinting(true)) };
}
