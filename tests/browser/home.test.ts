import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openBrowser } from './helpers/browser.ts';

describe('public site in Chromium', () => {
  let b: Awaited<ReturnType<typeof openBrowser>>;
  beforeAll(async () => {
    b = await openBrowser();
  });
  afterAll(() => b.close());

  it('shows the product name, the main navigation and the cautions', async () => {
    await b.page.goto('/');
    await expect(b.page.title()).resolves.toMatch(/Benchlight/);
    const nav = b.page.getByRole('navigation', { name: 'Main' });
    // The layout loads lazily after the title is set: wait for it before counting links.
    await nav.getByRole('link', { name: 'Reports' }).waitFor();
    for (const name of ['Reports', 'Compare', 'Methodology', 'Request a test', 'Subscribe']) {
      expect(await nav.getByRole('link', { name }).count(), name).toBe(1);
    }
    const footer = await b.page.locator('footer').innerText();
    expect(footer).toMatch(/measurements, not medical advice/i);
    expect(footer).toMatch(/near-infrared/i);
  });

  it('moves between pages from the main navigation, and answers unknown paths with a not-found page', async () => {
    await b.page.goto('/');
    await b.page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Compare' }).click();
    await b.page.waitForURL('**/compare');
    // The route module loads lazily: wait for its heading before reading the page.
    await b.page.getByRole('heading', { level: 1, name: 'Compare' }).waitFor();
    expect(await b.page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Compare' }).getAttribute('aria-current')).toBe('page');
    await b.page.goto('/no/such/page');
    await b.page.getByRole('heading', { level: 1, name: /not found/i }).waitFor();
    expect(await b.page.getByRole('heading', { level: 1 }).innerText()).toMatch(/not found/i);
  });
});
