/**
 * A report's addresses. Each version has its own page and readings file forever; the bare report
 * address and its downloads follow the latest version.
 */
const enc = encodeURIComponent;

export function reportPath(slug: string, version?: number | null): string {
  return version === undefined || version === null ? `/reports/${enc(slug)}` : `/reports/${enc(slug)}/versions/${version}`;
}

/** Readings as CSV: the latest version's (version null) or one version's, at a stable URL. */
export function readingsCsvUrl(slug: string, version: number | null): string {
  const base = `/api/public/reports/${enc(slug)}`;
  return version === null ? `${base}/readings.csv` : `${base}/versions/${version}/readings.csv`;
}

/** The figures with their units and the suggested citation: the latest version's (no version) or one version's. */
export function figuresJsonUrl(slug: string, version: number | null = null): string {
  const base = `/api/public/reports/${enc(slug)}`;
  return version === null ? `${base}/figures.json` : `${base}/versions/${version}/figures.json`;
}

/** A version number from the address, or null when it is not a whole number from 1 up. */
export function parseVersionParam(value: string | undefined): number | null {
  if (value === undefined || !/^[1-9]\d{0,4}$/.test(value)) return null;
  return Number(value);
}
