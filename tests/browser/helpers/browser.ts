import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { inject } from 'vitest';
import { chromium, type BrowserContext, type Page } from 'playwright-core';

/** A fresh headless Chromium profile (Debian's binary; nothing is downloaded). */
export async function openBrowser(): Promise<{ context: BrowserContext; page: Page; close: () => Promise<void> }> {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'benchlight-chromium-'));
  const context = await chromium.launchPersistentContext(dir, {
    executablePath: inject('chromiumPath'),
    args: [
      '--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run',
      '--disable-background-networking', '--disable-component-update', '--disable-sync',
    ],
    baseURL: inject('baseUrl'),
  });
  const page = context.pages()[0] ?? (await context.newPage());
  return {
    context,
    page,
    close: async () => {
      await context.close();
      fs.rmSync(dir, { recursive: true, force: true });
    },
  };
}

export async function signIn(page: Page, email: string, password: string): Promise<void> {
  await page.goto('/lab/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('navigation', { name: 'Lab' }).waitFor();
}
