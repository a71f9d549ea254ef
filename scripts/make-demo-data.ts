/**
 * Writes the demo scenario (fictional units, spectra in several export shapes, meter readings,
 * manifest.json) to a folder. Usage: npx tsx scripts/make-demo-data.ts [--out DIR] [--seed N]
 */
import { mkdirSync, rmSync, writeFileSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { buildDemoScenario, DEMO_SEED } from '#seeds/demo/scenario.ts';

function argValue(name: string): string | undefined {
  const i = process.argv.indexOf(name);
  return i >= 0 ? process.argv[i + 1] : undefined;
}

const outDir = resolve(argValue('--out') ?? 'demo-data');
const seed = Number(argValue('--seed') ?? DEMO_SEED);
if (!Number.isInteger(seed)) throw new Error('--seed must be an integer');

const started = performance.now();
const { manifest, files } = buildDemoScenario(seed);
// Start clean so files from an older scenario never linger beside the manifest.
rmSync(join(outDir, 'spectra'), { recursive: true, force: true });
rmSync(join(outDir, 'meter'), { recursive: true, force: true });
for (const file of files) {
  const path = join(outDir, file.path);
  mkdirSync(dirname(path), { recursive: true });
  writeFileSync(path, file.text, 'utf8');
}
writeFileSync(join(outDir, 'manifest.json'), JSON.stringify(manifest, null, 2) + '\n', 'utf8');
const seconds = ((performance.now() - started) / 1000).toFixed(2);
console.log(`Wrote ${files.length + 1} files for ${manifest.units.length} units to ${outDir} in ${seconds} s`);
