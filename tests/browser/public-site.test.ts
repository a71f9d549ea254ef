import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Page } from 'playwright-core';
import { DEMO_USERS } from '#seeds/data/demo-users.ts';
import { seriousAccessibilityViolations } from './helpers/axe.ts';
import { openBrowser, signIn } from './helpers/browser.ts';

const demo = (role: string) => DEMO_USERS.find((u) => u.role === role)!;

/** The covered shares of one body zone, as the table under the coverage map prints them. */
async function zoneShares(page: Page, zone: string): Promise<string> {
  const table = page.getByRole('table', { name: /Covered share of each body zone/ });
  return (await table.getByRole('row').filter({ has: page.getByRole('rowheader', { name: zone }) }).innerText()).trim();
}

async function expectAccessible(page: Page, label: string): Promise<void> {
  expect(await seriousAccessibilityViolations(page), `${label}: serious or critical accessibility violations`).toEqual([]);
}

describe('the public site in Chromium, as a reader and as an editor', () => {
  let b: Awaited<ReturnType<typeof openBrowser>>;
  beforeAll(async () => {
    b = await openBrowser();
  });
  afterAll(() => b.close());

  it('home → index sorted by 50 % spread width and filtered to panels → a report: distance and body size change the covered shares → its CSV matches the page → compare two', async () => {
    const page = b.page;
    await page.goto('/');
    await page.getByRole('heading', { level: 2, name: 'Latest reports' }).waitFor();
    await page.getByText(/Coverage at \d+ cm; dashed: emitting area/).first().waitFor();
    // At least three published demo reports, each with its small coverage picture.
    expect(await page.getByText(/Coverage at \d+ cm; dashed: emitting area/).count()).toBeGreaterThanOrEqual(3);
    await expectAccessible(page, 'home');

    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Reports' }).click();
    await page.getByRole('table', { name: /Published reports/ }).waitFor();
    await expectAccessible(page, 'reports index');
    await page.getByRole('button', { name: /^50 % spread, 15 cm/ }).click();
    await page.waitForURL(/sort=spread50/);
    await page.getByLabel('Category').selectOption({ label: 'Panel' });
    await page.waitForURL(/category=panel/);
    const table = page.getByRole('table', { name: /Published reports/ });
    const rows = table.locator('tbody tr');
    const count = await rows.count();
    expect(count).toBeGreaterThanOrEqual(3);
    const spreads: number[] = [];
    for (let i = 0; i < count; i++) {
      const cells = await rows.nth(i).locator('td, th').allInnerTexts();
      expect(cells[1]).toBe('Panel');
      spreads.push(Number(cells[7]));
    }
    // Sorted by the spread column, one way or the other, and the URL keeps the choice.
    const asc = [...spreads].sort((a, b2) => a - b2);
    expect([asc, [...asc].reverse()]).toContainEqual(spreads);
    await page.reload();
    await table.waitFor();
    expect(await rows.count()).toBe(count);

    // The two-unit report.
    await table.getByRole('link', { name: /Corvane Fenwick torso panel/ }).click();
    await page.waitForURL(/\/reports\/corvane-photonics-fenwick-torso-panel$/);
    await page.getByRole('table', { name: /Covered share of each body zone/ }).waitFor({ timeout: 30_000 });
    await expectAccessible(page, 'report');
    const atStart = await zoneShares(page, 'Chest');
    await page.getByRole('group', { name: 'Distance from the emitting surface' }).getByRole('radio', { name: '60 cm' }).check({ force: true });
    await page.getByRole('table', { name: /Covered share of each body zone at 60 cm/ }).waitFor();
    const at60 = await zoneShares(page, 'Chest');
    expect(at60).not.toBe(atStart);
    await page.locator('#coverage').getByRole('group', { name: 'Body size' }).getByRole('radio', { name: 'Small adult' }).check({ force: true });
    await expect.poll(() => zoneShares(page, 'Chest')).not.toBe(at60);

    // The CSV has the same centre reading the page shows as a key figure.
    const centre15 = (await page.locator('dt', { hasText: 'Centre irradiance at 15 cm' }).locator('xpath=following-sibling::dd[1]').innerText()).trim();
    const csvHref = await page.getByRole('link', { name: /Readings of the latest version \(CSV\)/ }).getAttribute('href');
    const csv = await (await page.request.get(csvHref!)).text();
    const [header, ...lines] = csv.trim().split('\n');
    expect(header).toBe('distance_cm,x_cm,y_cm,red_mw_cm2,nir_mw_cm2,combined_mw_cm2,unit_serial');
    const first = lines.map((l) => l.split(',')).find((c) => c[0] === '15' && c[1] === '0' && c[2] === '0')!;
    expect(centre15).toBe(`${Number(Number(first[5]).toPrecision(3))} mW/cm²`);

    // Compare two reports: the choice lives in the URL.
    await page.goto('/compare?r=corvane-photonics-fenwick-torso-panel&r=norrow-and-vale-holt-half-body-panel');
    const figures = page.getByRole('table', { name: /Key figures/ });
    await figures.waitFor({ timeout: 30_000 });
    const figuresText = await figures.innerText();
    expect(figuresText).toContain('Fenwick');
    expect(figuresText).toContain('Holt');
    await expectAccessible(page, 'compare');

    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Methodology' }).click();
    await page.getByRole('heading', { name: /What the numbers do not say/ }).waitFor();
    await expectAccessible(page, 'methodology');
  });

  it('an editor publishes a correction: the page shows version 2 with its note, version 1 stays readable', async () => {
    const { context } = b;
    const page = await context.newPage();
    await signIn(page, demo('editor').email, demo('editor').password);
    await page.goto('/lab/reports');
    await page.getByRole('link', { name: /Norrow & Vale Holt half-body panel/ }).first().click();
    await page.getByRole('heading', { name: 'Publish a correction' }).waitFor();
    const note = 'The 60 cm plane was re-read with the rail square; the figures did not change.';
    await page.getByLabel('Change note').fill(note);
    await page.getByRole('button', { name: 'Publish version 2' }).click();
    await page.getByRole('button', { name: 'Publish version 3' }).waitFor();

    await page.goto('/reports/norrow-and-vale-holt-half-body-panel');
    await page.getByText(/Version 2 of 2/).waitFor();
    expect(await page.locator('main').innerText()).toContain(note);
    await page.goto('/reports/norrow-and-vale-holt-half-body-panel/versions/1');
    await page.getByText(/Version 1 of 2/).waitFor();
    expect(await page.getByRole('heading', { level: 1 }).innerText()).toContain('Norrow & Vale Holt half-body panel');
    await page.close();
  });

  it('a write-up with a script tag, an onerror attribute and a javascript: link publishes without any of them', async () => {
    const { context } = b;
    const page = await context.newPage();
    let dialogs = 0;
    page.on('dialog', (d) => {
      dialogs++;
      void d.dismiss();
    });
    await signIn(page, demo('editor').email, demo('editor').password);
    // A run waiting for review, measured by the demo tester, is approved by the editor first.
    const origin = inject('baseUrl');
    const queue = await (await page.request.get('/api/lab/review')).json();
    const run = queue.items?.[0] ?? queue.runs?.[0];
    expect(run, 'the demo has a run waiting for review').toBeTruthy();
    const approved = await page.request.post(`/api/lab/runs/${run.id}/approve`, { headers: { Origin: origin }, data: { note: 'Approved for the browser test.' } });
    expect(approved.status()).toBe(200);

    await page.goto('/lab/reports/new');
    await page.getByRole('checkbox', { name: new RegExp(`Unit ${run.unit.serial}`) }).first().check();
    await page.getByLabel('Title').fill('Browser-test report with hostile markdown');
    await page.getByLabel('Summary').fill('A report whose write-up tries to run script on the public page.');
    await page.getByLabel('Write-up').fill(
      'Plain words first.\n\n<script>alert("script")</script>\n\n<img src="x" onerror="alert(\'onerror\')" alt="bad">\n\n[click me](javascript:alert("link"))\n\n<p style="color:red">styled</p>',
    );
    await page.getByRole('button', { name: 'Create the draft' }).click();
    await page.getByRole('button', { name: 'Publish…' }).click();
    await page.getByRole('button', { name: /^Publish now at \/reports\// }).click();
    await page.getByRole('heading', { name: 'Publish a correction' }).waitFor();
    const slug = (await (await page.request.get('/api/public/reports')).json()).reports.find((r: { title: string }) => r.title === 'Browser-test report with hostile markdown').slug;

    await page.goto(`/reports/${slug}`);
    await page.getByText('Plain words first.').waitFor();
    const writeUp = page.locator('#write-up');
    expect(await writeUp.innerText()).toContain('styled');
    expect(await writeUp.locator('script').count()).toBe(0);
    expect(await writeUp.locator('[onerror]').count()).toBe(0);
    expect(await writeUp.locator('a[href^="javascript:"]').count()).toBe(0);
    expect(await writeUp.locator('[style]').count()).toBe(0);
    expect(dialogs).toBe(0);
    await page.close();
  });
});
