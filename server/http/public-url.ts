import type { Request } from 'express';

/** The site's address as readers reach it: PUBLIC_BASE_URL when set, else this request's own. */
export function publicBaseUrl(req: Request, configured: string | undefined): string {
  if (configured) return configured.replace(/\/+$/, '');
  return `${req.protocol}://${req.get('host')}`;
}
