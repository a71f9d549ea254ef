import { readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { decodeTextBytes } from './decode-text.ts';
import { importSpectrum } from './spectrum-import.ts';
import { summarizeSpectrum } from '../spectral/spectrum-summary.ts';
import { DEFAULT_BANDS } from '../spectral/band-list.ts';

const dir = fileURLToPath(new URL('../../../tests/fixtures/spectra', import.meta.url));

interface Expected {
  ok: boolean;
  unit: string | null;
  samples: number;
  rangeNm?: [number, number];
  bands?: Record<string, { wm2: number | null; partial: boolean }>;
  totalWm2?: number;
  peakNm?: number;
  relTolerance?: number;
  metadata?: Record<string, string>;
  issues: { code: string; line: number | null; severity: string }[];
}

const expected = JSON.parse(readFileSync(join(dir, 'expected.json'), 'utf8')) as Record<string, Expected>;
const fixtureFiles = readdirSync(dir).filter((f) => !/\.(ts|md|json)$/.test(f));

describe('spectrum fixture corpus', () => {
  it('has an expectation for every file and a file for every expectation', () => {
    expect(fixtureFiles.sort()).toEqual(Object.keys(expected).filter((k) => !k.startsWith('_')).sort());
  });

  for (const file of fixtureFiles) {
    it(file, () => {
      // Expected values: see the _about note in expected.json (linear spectrum integrated by hand;
      // Gaussian lines integrated analytically).
      const want = expected[file];
      const decoded = decodeTextBytes(readFileSync(join(dir, file)));
      const got = importSpectrum(decoded.text);
      const issues = [...decoded.issues, ...got.issues].map(({ code, line, severity }) => ({ code, line, severity }));
      expect(issues).toEqual(want.issues);
      expect(got.ok).toBe(want.ok);
      expect(got.unit).toBe(want.unit);
      if (want.metadata) expect(got.metadata).toMatchObject(want.metadata);
      if (!want.ok) {
        expect(got.spectrum).toBeNull();
        return;
      }
      const summary = summarizeSpectrum(got.spectrum!, DEFAULT_BANDS);
      const close = (value: number, target: number) =>
        expect(Math.abs(value - target)).toBeLessThanOrEqual((want.relTolerance ?? 1e-12) * Math.max(1, Math.abs(target)));
      expect(summary.samples).toBe(want.samples);
      expect(summary.rangeNm).toEqual(want.rangeNm);
      expect(summary.peakNm).toBe(want.peakNm);
      close(summary.totalWm2, want.totalWm2!);
      for (const [name, band] of Object.entries(want.bands!)) {
        if (band.wm2 === null) expect(summary.bands[name].wm2).toBeNull();
        else close(summary.bands[name].wm2!, band.wm2);
        expect(summary.bands[name].partial).toBe(band.partial);
      }
    });
  }

  it('refuses the UTF-16 fixture when it is read as a UTF-8 string', () => {
    const text = readFileSync(join(dir, 'utf16le-bom.csv'), 'utf8');
    expect(importSpectrum(text).issues.map((i) => i.code)).toEqual(['utf16']);
  });
});
