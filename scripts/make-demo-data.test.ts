import { describe, expect, it } from 'vitest';
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { buildDemoScenario, DEMO_SEED } from '#seeds/demo/scenario.ts';

describe('make-demo-data script', () => {
  it('writes the manifest and every file it lists, byte for byte, in under 5 s', () => {
    const out = mkdtempSync(join(tmpdir(), 'benchlight-demo-'));
    try {
      const log = execFileSync('npx', ['tsx', 'scripts/make-demo-data.ts', '--out', out], { encoding: 'utf8' });
      const seconds = Number(/in ([\d.]+) s/.exec(log)?.[1]);
      expect(seconds).toBeLessThan(5);
      const manifest = JSON.parse(readFileSync(join(out, 'manifest.json'), 'utf8'));
      const { manifest: expected, files } = buildDemoScenario(DEMO_SEED);
      expect(manifest).toEqual(JSON.parse(JSON.stringify(expected)));
      for (const run of manifest.runs) {
        expect(readdirSync(join(out, 'spectra', run.id)).length).toBe(run.files.length);
      }
      // The BOM and CRLF survive the trip through the file system.
      const bom = files.find((x) => x.text.startsWith('\uFEFF'))!;
      const crlf = files.find((x) => x.text.includes('\r\n'))!;
      for (const f of [files[0], bom, crlf]) {
        expect(readFileSync(join(out, f.path), 'utf8')).toBe(f.text);
      }
    } finally {
      rmSync(out, { recursive: true, force: true });
    }
  }, 60_000);
});
