import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import type { Locator } from 'playwright-core';
import { DEMO_USERS } from '#seeds/data/demo-users.ts';
import { buildDemoScenario, DEMO_SEED } from '#seeds/demo/scenario.ts';
import { FORMAT_UNIT_CANONICAL } from '#seeds/demo/export-formats.ts';
import { importSpectrum } from '#shared/measurement/import/spectrum-import.ts';
import { DEFAULT_BANDS } from '#shared/measurement/spectral/band-list.ts';
import { summarizeSpectrum } from '#shared/measurement/spectral/spectrum-summary.ts';
import { formatFigure, prettyUnit } from '#src/lib/format.ts';
import { openBrowser, signIn } from './helpers/browser.ts';

const tester = DEMO_USERS.find((u) => u.role === 'tester')!;
const { manifest, files } = buildDemoScenario(DEMO_SEED);
const textOf = (p: string) => files.find((f) => f.path === p)!.text;

/** One centre spectrum at 15 cm from each demo run: one file of each export shape. */
const spectra = manifest.runs.map((run) => {
  const file = run.files.find((f) => f.distanceCm === 15 && f.xCm === 0 && f.yCm === 0)!;
  const unit = manifest.units.find((u) => u.id === run.unitId)!;
  return {
    name: `${run.id}-${path.basename(file.path)}`,
    format: run.format,
    text: textOf(file.path),
    // The generating model's centre irradiance (its truth, not a measurement), mW/cm².
    modelCentreMwCm2: unit.generatingModel.centerMwCm2ByDistanceCm['15'],
  };
});
const meterRun = manifest.runs[0];
const meterName = path.basename(meterRun.meterReadings.path);

const escape = (s: string) => s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

async function rowValue(card: Locator, label: string): Promise<string> {
  return card.getByRole('row', { name: new RegExp(`^${escape(label)}`) }).locator('td').innerText();
}

describe('File check in Chromium, with the demo exports', () => {
  let dir: string;
  let b: Awaited<ReturnType<typeof openBrowser>>;

  beforeAll(() => {
    dir = fs.mkdtempSync(path.join(os.tmpdir(), 'benchlight-file-check-'));
    // Written as UTF-8 exactly as the demo generator gives them (the comma-bom shape keeps its BOM).
    for (const s of spectra) fs.writeFileSync(path.join(dir, s.name), s.text, 'utf8');
    fs.writeFileSync(path.join(dir, meterName), textOf(meterRun.meterReadings.path), 'utf8');
  });
  afterAll(() => fs.rmSync(dir, { recursive: true, force: true }));
  beforeEach(async () => {
    b = await openBrowser();
  });
  afterEach(() => b.close());

  it('a tester checks one spectrum of each export shape and a meter-readings file', async () => {
    const { page } = b;
    await signIn(page, tester.email, tester.password);
    await page.getByRole('navigation', { name: 'Lab' }).getByRole('link', { name: 'File check' }).click();
    await page.getByRole('heading', { level: 1, name: 'File check' }).waitFor();
    expect(await page.getByText('Files are read in your browser; nothing is uploaded.').count()).toBe(1);

    await page.getByLabel('Spectrum files', { exact: true }).setInputFiles(spectra.map((s) => path.join(dir, s.name)));
    await page.getByText(`Checked ${spectra.length} spectrum files: ${spectra.length} readable, 0 rejected.`).waitFor();

    for (const s of spectra) {
      // The file's card: the nearest section around its heading.
      const card = page.getByRole('heading', { level: 3, name: new RegExp(escape(s.name)) }).locator('xpath=ancestor::section[1]');
      expect(await card.getByText('Readable').count()).toBe(1);

      const unit = prettyUnit(FORMAT_UNIT_CANONICAL[s.format].canonical);
      expect(await rowValue(card, 'Unit in the file')).toBe(`${unit} (as the file states)`);

      // The page shows what the shared core computes from the same text…
      const summary = summarizeSpectrum(importSpectrum(s.text).spectrum!, DEFAULT_BANDS);
      expect(await rowValue(card, 'Red (600–700 nm)')).toContain(`${formatFigure(summary.bands.red.wm2! / 10)} mW/cm²`);
      expect(await rowValue(card, 'Near-infrared (700–1100 nm)')).toContain(`${formatFigure(summary.bands.nir.wm2! / 10)} mW/cm²`);
      // …and its total is the generating model's centre irradiance within the demo's noise (5 %).
      const total = await rowValue(card, 'Total over');
      const shown = Number(/([\d.,]+) mW\/cm²/.exec(total)![1].replace(',', ''));
      expect(Math.abs(shown - s.modelCentreMwCm2) / s.modelCentreMwCm2).toBeLessThan(0.05);

      const chart = card.locator('[data-chart="spectrum"] svg').first();
      await chart.waitFor();
      expect(await card.locator('[data-chart="spectrum"] .recharts-area-curve').count()).toBeGreaterThan(0);
    }
    expect(await page.getByRole('heading', { name: 'Cautions for these figures' }).count()).toBeGreaterThan(0);

    // Dropped on the box instead of picked: a file naming no unit is refused, with its reason.
    const dropped = await page.evaluateHandle(() => {
      const transfer = new DataTransfer();
      transfer.items.add(new File(['Wavelength (nm),Irradiance\n600,1\n610,1\n'], 'dropped.csv', { type: 'text/csv' }));
      return transfer;
    });
    const zone = page.getByLabel('Spectrum files', { exact: true }).locator('xpath=..');
    await zone.dispatchEvent('dragover', { dataTransfer: dropped });
    await zone.dispatchEvent('drop', { dataTransfer: dropped });
    const droppedCard = page.getByRole('heading', { level: 3, name: /dropped\.csv/ }).locator('xpath=ancestor::section[1]');
    await droppedCard.getByText('Rejected').waitFor();
    expect(await droppedCard.getByRole('listitem').filter({ hasText: 'No unit found' }).innerText()).toMatch(/^Error\s+Whole file/);

    await page.getByLabel('Meter readings file', { exact: true }).setInputFiles(path.join(dir, meterName));
    await page.getByText(/Checked the meter readings file: 135 readings on 3 planes \(15 cm, 30 cm, 60 cm\)\./).waitFor();
    const map = page.getByRole('img', { name: /Coverage map at 15 cm/ });
    await map.waitFor();
    expect(await page.locator('[data-chart="coverage-map"] svg path').count()).toBeGreaterThan(3);
    const widths = page.getByRole('table', { name: 'Spread widths and areas at 15 cm' });
    for (const pct of [80, 50, 25]) {
      expect(await widths.getByRole('row', { name: new RegExp(`^${pct} % of peak`) }).innerText()).toMatch(/\d cm/);
    }
    // The peak is the largest reading of the plane in the file itself.
    const plane15 = textOf(meterRun.meterReadings.path)
      .trim()
      .split('\n')
      .slice(1)
      .map((l) => l.split(',').map(Number))
      .filter(([d]) => d === 15)
      .map((r) => r[3]);
    expect(await page.getByRole('table', { name: 'Plane at 15 cm' }).innerText()).toContain(`${formatFigure(Math.max(...plane15))} mW/cm²`);
    expect(await page.getByText(/Falloff exponent across the planes/).innerText()).toMatch(/\d\.\d\d/);

    // The radios are drawn as segments: a mouse clicks the label, as a tester would.
    await page.locator('label', { has: page.getByRole('radio', { name: '60 cm' }) }).click();
    expect(await page.getByRole('radio', { name: '60 cm' }).isChecked()).toBe(true);
    await page.getByRole('table', { name: 'Spread widths and areas at 60 cm' }).waitFor();
  });
});
