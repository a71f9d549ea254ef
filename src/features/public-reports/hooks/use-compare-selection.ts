import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';

export const MAX_COMPARED = 4;
export const MIN_COMPARED = 2;
const SLUG = /^[a-z0-9-]{1,100}$/;

export interface CompareSelection {
  /** The reports chosen, in the order the URL gives them (?r=a&r=b), at most four. */
  slugs: string[];
  /** The distance the reader chose (?d=30), or null for the page's default. */
  distanceCm: number | null;
  add: (slug: string) => void;
  remove: (slug: string) => void;
  setDistance: (distanceCm: number) => void;
}

/** The comparison lives in the URL, so it can be shared, bookmarked and walked back. */
export function useCompareSelection(): CompareSelection {
  const [params, setParams] = useSearchParams();
  const slugs = useMemo(() => [...new Set(params.getAll('r').filter((s) => SLUG.test(s)))].slice(0, MAX_COMPARED), [params]);
  const d = Number(params.get('d'));
  const distanceCm = params.get('d') !== null && Number.isFinite(d) && d > 0 ? d : null;

  const write = useCallback(
    (nextSlugs: string[], nextDistance: number | null) => {
      const next = new URLSearchParams();
      for (const s of nextSlugs) next.append('r', s);
      if (nextDistance !== null) next.set('d', String(nextDistance));
      setParams(next);
    },
    [setParams],
  );

  return {
    slugs,
    distanceCm,
    add: (slug) => {
      if (!slugs.includes(slug) && slugs.length < MAX_COMPARED) write([...slugs, slug], distanceCm);
    },
    remove: (slug) => write(
      slugs.filter((s) => s !== slug),
      distanceCm,
    ),
    setDistance: (distance) => write(slugs, distance),
  };
}
