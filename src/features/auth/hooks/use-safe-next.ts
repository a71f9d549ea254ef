import { useSearchParams } from 'react-router-dom';

/**
 * Where to go after signing in: `?next=` if it is a path inside the lab, else /lab.
 * Anything else (another site, `//host`, a public page) is ignored: no open redirects.
 */
export function safeNext(next: string | null | undefined): string {
  if (!next) return '/lab';
  if (!next.startsWith('/lab')) return '/lab';
  if (next.startsWith('//') || next.includes('\\')) return '/lab';
  if (next.startsWith('/lab/sign-in')) return '/lab';
  const rest = next.slice(4);
  if (rest && !/^[/?#]/.test(rest)) return '/lab';
  return next;
}

export function useSafeNext(): string {
  const [params] = useSearchParams();
  return safeNext(params.get('next'));
}
