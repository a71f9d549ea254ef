import { readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { checkMeterReadingsFile } from '../check/check-meter-readings-file.ts';

const dir = fileURLToPath(new URL('../../../tests/fixtures/meter-readings', import.meta.url));

interface Expected {
  ok: boolean;
  readings: number;
  distancesCm: number[];
  issues: { code: string; line: number | null; severity: string }[];
}

const expected = JSON.parse(readFileSync(join(dir, 'expected.json'), 'utf8')) as Record<string, Expected>;
const fixtureFiles = readdirSync(dir).filter((f) => !/\.(ts|md|json)$/.test(f));

describe('meter-readings fixture corpus', () => {
  it('has an expectation for every file and a file for every expectation', () => {
    expect(fixtureFiles.sort()).toEqual(Object.keys(expected).filter((k) => !k.startsWith('_')).sort());
  });

  for (const file of fixtureFiles) {
    it(file, () => {
      // Expected values: see the _about note in expected.json (counts written by the generators).
      const want = expected[file];
      const got = checkMeterReadingsFile(new Uint8Array(readFileSync(join(dir, file))));
      expect(got.issues.map(({ code, line, severity }) => ({ code, line, severity }))).toEqual(want.issues);
      expect(got.ok).toBe(want.ok);
      expect(got.result!.readings).toHaveLength(want.readings);
      expect(got.planes.map((p) => p.distanceCm)).toEqual(want.distancesCm);
    });
  }
});
