import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Locator, Page } from 'playwright-core';
import { DEMO_USERS } from '#seeds/data/demo-users.ts';
import { buildDemoScenario } from '#seeds/demo/scenario.ts';
import { openBrowser, signIn } from './helpers/browser.ts';

const demo = (role: string) => DEMO_USERS.find((u) => u.role === role)!;

/** The demo generator's 135 files of the body panel's run, written to a folder as a tester has them. */
function demoFiles(dir: string): string[] {
  const { manifest, files } = buildDemoScenario();
  const text = new Map(files.map((f) => [f.path, f.text]));
  return manifest.runs[0].files.map((f) => {
    const file = path.join(dir, f.path.split('/').pop()!);
    fs.writeFileSync(file, text.get(f.path)!);
    return file;
  });
}

/** Opens a catalogue tab's "Add …" form, fills it inside its own panel and submits it. */
async function addInTab(page: Page, tab: string, button: string, fill: (form: Locator) => Promise<void>, submit: string) {
  await page.getByRole('tab', { name: tab }).click();
  await page.getByRole('button', { name: button, exact: true }).first().click();
  const form = page.getByRole('region', { name: /^Add an? / });
  await fill(form);
  await form.getByRole('button', { name: submit, exact: true }).click();
}

async function waitAnalysed(page: Page, expected: number) {
  await page.getByRole('progressbar', { name: 'Analysis' }).and(page.locator(`[aria-valuenow="${expected}"]`)).waitFor({ timeout: 90_000 });
}

/** Until no reading of the run awaits analysis and its figures are current (bounded: 90 s). */
async function settled(page: Page, runId: string) {
  for (let i = 0; i < 180; i++) {
    const run = await (await page.request.get(`/api/lab/runs/${runId}`)).json();
    const readings = await (await page.request.get(`/api/lab/runs/${runId}/readings`)).json();
    if (!run.run.progress.analysing && readings.readings.every((r: { state: string }) => r.state !== 'pending')) return;
    await page.waitForTimeout(500);
  }
  throw new Error('the run did not settle within 90 s');
}

describe('the lab workflow in Chromium, against the real server, worker and database', () => {
  let dir: string;
  let files: string[];
  beforeAll(() => {
    dir = fs.mkdtempSync(path.join(os.tmpdir(), 'benchlight-upload-'));
    files = demoFiles(dir);
  });
  afterAll(() => fs.rmSync(dir, { recursive: true, force: true }));

  it('catalogue → run on a preset → 135 files → submit → change request on a reading → replacement → approval', { timeout: 300_000 }, async () => {
    const tester = await openBrowser();
    const editor = await openBrowser();
    try {
      const t = tester.page;
      await signIn(t, demo('tester').email, demo('tester').password);

      // The catalogue: a maker, a model, a unit and an instrument, through the forms.
      await t.getByRole('navigation', { name: 'Lab' }).getByRole('link', { name: 'Catalog' }).click();
      await addInTab(t, 'Makers', 'Add maker', (p) => p.getByLabel('Name').fill('Brightwell Optics (browser test)'), 'Add maker');
      await t.getByRole('cell', { name: 'Brightwell Optics (browser test)' }).or(t.getByRole('rowheader', { name: 'Brightwell Optics (browser test)' })).first().waitFor();
      await addInTab(
        t,
        'Models',
        'Add model',
        async (p) => {
          await p.getByLabel('Maker').selectOption({ label: 'Brightwell Optics (browser test)' });
          await p.getByLabel('Name').fill('Lumen torso panel');
          await p.getByLabel('Category').selectOption('panel');
          await p.getByLabel('Width (cm)').fill('80');
          await p.getByLabel('Height (cm)').fill('34');
        },
        'Add model',
      );
      await t.getByText('Lumen torso panel').first().waitFor();
      await addInTab(
        t,
        'Units',
        'Add unit',
        async (p) => {
          await p.getByLabel('Model').selectOption({ label: 'Brightwell Optics (browser test) Lumen torso panel' });
          await p.getByLabel('Serial number').fill('BW-LT-0001');
        },
        'Add unit',
      );
      await t.getByText('BW-LT-0001').first().waitFor();
      await addInTab(
        t,
        'Instruments',
        'Add instrument',
        async (p) => {
          await p.getByLabel('Kind').selectOption('spectroradiometer');
          await p.getByLabel('Name').fill('Browser-test spectroradiometer');
          await p.getByLabel('Serial number').fill('BT-SR-1');
          await p.getByLabel('Calibrated on').fill('2026-06-01');
          await p.getByLabel('Due on').fill('2027-06-01');
          await p.getByLabel('Uncertainty (%)').fill('4');
        },
        'Add instrument',
      );
      await t.getByText('Browser-test spectroradiometer').first().waitFor();

      // A run on the standard preset of the model's emitting area.
      await t.goto('/lab/runs/new');
      await t.getByLabel('Unit').selectOption({ label: 'Brightwell Optics (browser test) Lumen torso panel — BW-LT-0001' });
      await t.getByLabel('Instrument').selectOption({ label: 'Browser-test spectroradiometer — BT-SR-1' });
      await t.getByText(/Standard: 9 × 5 points/).waitFor();
      await t.getByRole('button', { name: 'Create the run' }).click();
      await t.waitForURL(/\/lab\/runs\/[0-9a-f-]{36}$/);
      const runUrl = new URL(t.url()).pathname;

      // 135 files in one batch; the progress bar follows the analysis.
      expect(files).toHaveLength(135);
      await t.getByLabel('Spectrum files').setInputFiles(files);
      await t.getByRole('button', { name: /Upload 135 files/ }).click();
      await t.getByText(/135 files stored and queued for analysis/).waitFor({ timeout: 60_000 });
      await waitAnalysed(t, 135);
      await t.getByRole('img', { name: /Coverage map at 15 cm/ }).waitFor({ timeout: 60_000 });
      await t.getByRole('button', { name: 'Submit for review' }).click();
      await t.getByText('Submitted for review.').waitFor();

      // The editor, who did not measure the run, comments on one reading and sends it back.
      const e = editor.page;
      await signIn(e, demo('editor').email, demo('editor').password);
      await e.goto(runUrl);
      // The segments are styled labels over native radios (visually hidden but focusable).
      await e.getByRole('radio', { name: '30 cm' }).last().check({ force: true });
      await e.getByRole('button', { name: /^30 cm, x 0, y 0:/ }).click();
      await e.getByLabel('Add a comment').fill('The 30 cm centre reads low against its neighbours; measure it again.');
      await e.getByRole('button', { name: 'Add comment' }).click();
      // The posted comment (the box may still hold the text a moment while it clears).
      await e.locator('p').filter({ hasText: 'The 30 cm centre reads low against its neighbours; measure it again.' }).waitFor();
      await e.getByLabel('Note (needed to send it back)').fill('Re-measure the 30 cm centre.');
      await e.getByRole('button', { name: 'Request changes' }).click();
      await e.getByText('Sent back to the tester with your note.').waitFor();

      // The tester uploads a replacement for that point and submits again.
      await t.reload();
      const original = files.find((f) => path.basename(f).startsWith('d30_x0_y0'))!;
      const replacement = path.join(dir, 'replacement', path.basename(original));
      fs.mkdirSync(path.dirname(replacement));
      fs.writeFileSync(replacement, `${fs.readFileSync(original, 'utf8')}\n`);
      await t.getByLabel('Spectrum files').setInputFiles([replacement]);
      await t.getByRole('button', { name: /Upload 1 file/ }).click();
      await t.getByText(/1 file stored and queued for analysis/).waitFor({ timeout: 60_000 });
      // The bar may still show the count from before the replacement: ask the server until the
      // new file is analysed and the figures are current, then let the page catch up.
      await settled(t, runUrl.split('/').pop()!);
      await t.reload();
      await waitAnalysed(t, 135);
      await t.getByRole('button', { name: 'Submit for review' }).click();
      await t.getByText('Submitted for review.').waitFor();

      // A tester cannot approve (the server refuses); the editor approves.
      const base = inject('baseUrl');
      const runId = runUrl.split('/').pop()!;
      const refused = await t.request.post(`/api/lab/runs/${runId}/approve`, { headers: { Origin: base }, data: {} });
      expect(refused.status()).toBe(403);
      await e.reload();
      await e.getByRole('button', { name: 'Approve' }).click();
      await e.getByText('Approved.', { exact: true }).waitFor();

      // The audit trail lists every step.
      await e.reload();
      const audit = await e.getByRole('table', { name: 'Audit trail' }).innerText();
      for (const step of ['created the run', 'uploaded files', 'submitted it', 'commented', 'requested changes', 'approved it']) expect(audit).toContain(step);
      expect(audit).toContain('Re-measure the 30 cm centre.');
    } finally {
      await tester.close();
      await editor.close();
    }
  });
});
