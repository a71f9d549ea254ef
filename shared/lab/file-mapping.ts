/**
 * Which grid point a spectrum file belongs to: by its name, `d<distance>_x<x>_y<y>.<ext>` in cm
 * (e.g. `d30_x-10_y0.csv`, `d15_x7.5_y-5.txt`), with `_start` or `_end` before the extension for
 * the centre readings of the drift check; or by a manifest CSV `file,distance_cm,x_cm,y_cm[,slot]`.
 * Pure: the upload route and the bench CLI use the same rules.
 */
import { parse } from '#csv-parse/sync';
import { gridContains, type GridPoint, type ReadingSlot, type RunGrid } from './grid-point.ts';

export interface MappedFile extends GridPoint {
  slot: ReadingSlot;
}

const NUMBER = String.raw`[-+]?\d+(?:[.,]\d+)?`;
const NAME = new RegExp(String.raw`^d(${NUMBER})_x(${NUMBER})_y(${NUMBER})(?:_(start|end))?\.[a-z0-9]+$`, 'i');

/** The base name of a path a browser or an archive may send (`run1/d15_x0_y0.csv`). */
export function baseName(fileName: string): string {
  return fileName.split(/[\\/]/).pop() ?? fileName;
}

const toNumber = (s: string) => Number(s.replace(',', '.'));

/** The point a file name states, or null when the name does not follow the pattern. */
export function pointFromFileName(fileName: string): MappedFile | null {
  const m = NAME.exec(baseName(fileName).trim());
  if (!m) return null;
  const slot: ReadingSlot = m[4] ? (m[4].toLowerCase() === 'start' ? 'center_start' : 'center_end') : 'grid';
  return { distanceCm: toNumber(m[1]), xCm: toNumber(m[2]), yCm: toNumber(m[3]), slot };
}

/** A manifest problem, located by line (1-based) and column name. */
export interface ManifestError {
  line: number | null;
  column: string | null;
  message: string;
}

export type ManifestResult = { ok: true; entries: Map<string, MappedFile> } | { ok: false; errors: ManifestError[] };

const COLUMNS = ['file', 'distance_cm', 'x_cm', 'y_cm'] as const;

/**
 * Reads a manifest. Every row must name a file once and a point on the run's grid; centre
 * readings (slot `center_start` / `center_end`, or `start` / `end`) must sit at x 0, y 0 of a
 * grid distance. Any problem rejects the whole manifest with located errors: a partly applied
 * manifest would put files on the wrong points silently.
 */
export function parseManifest(text: string, grid: RunGrid): ManifestResult {
  let rows: string[][];
  try {
    rows = parse(text.replace(/^\uFEFF/, ''), { relax_column_count: true, skip_empty_lines: true, trim: true }) as string[][];
  } catch (err) {
    return { ok: false, errors: [{ line: null, column: null, message: `The manifest is not a CSV file: ${err instanceof Error ? err.message : String(err)}` }] };
  }
  if (rows.length === 0) return { ok: false, errors: [{ line: null, column: null, message: 'The manifest is empty.' }] };
  const header = rows[0].map((h) => h.toLowerCase());
  const missing = COLUMNS.filter((c) => !header.includes(c));
  if (missing.length > 0) {
    return { ok: false, errors: [{ line: 1, column: null, message: `The header must name file,distance_cm,x_cm,y_cm; missing: ${missing.join(', ')}.` }] };
  }
  const col = (name: string) => header.indexOf(name);
  const slotCol = header.indexOf('slot');
  const errors: ManifestError[] = [];
  const entries = new Map<string, MappedFile>();
  rows.slice(1).forEach((cells, i) => {
    const line = i + 2;
    const file = baseName(cells[col('file')] ?? '');
    if (!file) {
      errors.push({ line, column: 'file', message: `Line ${line} names no file.` });
      return;
    }
    const nums: number[] = [];
    for (const c of ['distance_cm', 'x_cm', 'y_cm']) {
      const raw = cells[col(c)] ?? '';
      const v = toNumber(raw);
      if (raw === '' || !Number.isFinite(v)) {
        errors.push({ line, column: c, message: `Line ${line}: ${c} "${raw}" is not a number.` });
        return;
      }
      nums.push(v);
    }
    const rawSlot = slotCol >= 0 ? (cells[slotCol] ?? '').toLowerCase() : '';
    const slot: ReadingSlot | null =
      rawSlot === '' || rawSlot === 'grid' ? 'grid' : rawSlot === 'start' || rawSlot === 'center_start' ? 'center_start' : rawSlot === 'end' || rawSlot === 'center_end' ? 'center_end' : null;
    if (slot === null) {
      errors.push({ line, column: 'slot', message: `Line ${line}: slot "${rawSlot}" is not grid, start or end.` });
      return;
    }
    const point = { distanceCm: nums[0], xCm: nums[1], yCm: nums[2], slot };
    const onGrid = slot === 'grid' ? gridContains(grid, point) : gridContains(grid, point) && point.xCm === 0 && point.yCm === 0;
    if (!onGrid) {
      errors.push({
        line,
        column: null,
        message:
          slot === 'grid'
            ? `Line ${line}: ${file} is mapped to ${point.distanceCm} cm, x ${point.xCm}, y ${point.yCm}, which is not a point of this run's grid.`
            : `Line ${line}: a centre reading must be at x 0, y 0 of one of the run's distances (${grid.distancesCm.join(', ')} cm).`,
      });
      return;
    }
    if (entries.has(file)) {
      errors.push({ line, column: 'file', message: `Line ${line}: ${file} is listed twice.` });
      return;
    }
    entries.set(file, point);
  });
  return errors.length > 0 ? { ok: false, errors } : { ok: true, entries };
}
