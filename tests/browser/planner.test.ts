import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openBrowser } from './helpers/browser.ts';

/** Pages in a PDF: one "/Type /Page" object per page (ISO 32000-1, 7.7.3.3), not counting "/Pages". */
function pdfPageCount(pdf: Buffer): number {
  return (pdf.toString('latin1').match(/\/Type\s*\/Page(?![a-z])/g) ?? []).length;
}

describe('the session planner on a report page, in Chromium', () => {
  let b: Awaited<ReturnType<typeof openBrowser>>;
  beforeAll(async () => {
    b = await openBrowser();
  });
  afterAll(() => b.close());

  it('chest + abdomen, medium body, 10 J/cm², 90 %: a plan of each kind with its dose map; another body changes the plans; the plan card prints on one page with the cautions', async () => {
    const page = b.page;
    await page.goto('/reports/corvane-photonics-fenwick-torso-panel');
    const planner = page.locator('#planner');
    await planner.getByRole('heading', { name: 'Session planner' }).waitFor({ timeout: 30_000 });

    // The reader's choices, made explicitly (they are also the starting ones).
    for (const zone of ['Chest', 'Abdomen']) await planner.getByRole('checkbox', { name: zone, exact: true }).check();
    for (const zone of ['Face', 'Neck', 'Left thigh', 'Right thigh']) await planner.getByRole('checkbox', { name: zone, exact: true }).uncheck();
    const bodySize = planner.getByRole('group', { name: 'Body size (shoulder width × height)' });
    await bodySize.getByRole('radio', { name: /^Medium/ }).check({ force: true });
    await planner.getByRole('group', { name: 'Target dose H* (J/cm²)' }).getByRole('radio', { name: '10', exact: true }).check({ force: true });
    await planner.getByLabel('Share of the area to reach H* (%)').fill('90');

    const best = planner.getByRole('table', { name: /Best plan of each kind for chest \+ abdomen at 10(\.0)? J\/cm²/ });
    await best.waitFor({ timeout: 60_000 });
    await planner.getByText(/plans, ranked by total minutes\./).waitFor({ timeout: 60_000 });
    const bestText = await best.innerText();
    for (const kind of ['One position, centred', 'Moved between positions', 'Units side by side']) expect(bestText).toContain(kind);
    // The chosen plan drawn as a dose map over the body.
    await planner.getByRole('img', { name: /Dose map of the plan at \d+ cm/ }).waitFor();
    // The cautions and the plain statement of what a plan is.
    const plannerText = await planner.innerText();
    expect(plannerText).toMatch(/arithmetic on our measurements of this unit, not treatment advice/);
    expect(plannerText).toMatch(/Local rules and licensed practice come first/);

    // A larger body: the same zones are larger, so the plans change.
    await bodySize.getByRole('radio', { name: /^Large/ }).check({ force: true });
    await expect.poll(async () => best.innerText(), { timeout: 60_000 }).not.toBe(bestText);
    await planner.getByText(/plans, ranked by total minutes\./).waitFor({ timeout: 60_000 });

    // Print: the browser's dialogue is replaced by a counter; the card is then printed to PDF.
    await page.evaluate(() => {
      (window as unknown as { printCalls: number }).printCalls = 0;
      window.print = () => {
        (window as unknown as { printCalls: number }).printCalls++;
      };
    });
    await planner.getByRole('button', { name: 'Print plan card' }).click();
    await expect.poll(() => page.evaluate(() => (window as unknown as { printCalls: number }).printCalls)).toBe(1);
    const card = page.getByTestId('plan-card');
    await page.emulateMedia({ media: 'print' });
    expect(await card.isVisible()).toBe(true);
    const cardText = await card.innerText();
    expect(cardText).toMatch(/Session plan card: Corvane Photonics Fenwick torso panel/);
    expect(cardText).toMatch(/48 × 188 cm|48 cm/);
    expect(cardText).toMatch(/Protect your eyes/);
    expect(cardText).toMatch(/not treatment advice/);
    const pdf = await page.pdf({ format: 'A4', preferCSSPageSize: true });
    expect(pdfPageCount(pdf)).toBe(1);
    await page.emulateMedia({ media: 'screen' });
  });
});
