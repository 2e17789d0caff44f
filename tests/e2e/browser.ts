import { mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { inject } from 'vitest';

export const DEMO_PASSWORD = 'brass-gauge-harbour-lamp';
export const SCREENSHOTS = path.resolve('test-results/screenshots');

export interface Browser {
  context: BrowserContext;
  page: Page;
  close(): Promise<void>;
}

/** Debian's Chromium, headless, with a fresh profile, pointed at the test server. */
export async function openBrowser(viewport = { width: 1440, height: 900 }): Promise<Browser> {
  const profile = mkdtempSync(path.join(tmpdir(), 'shipkeeper-chromium-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: '/usr/bin/chromium',
    baseURL: inject('baseUrl'),
    viewport,
    args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
  const page = context.pages()[0] ?? (await context.newPage());
  return {
    context,
    page,
    async close() {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}

export async function signIn(page: Page, email: string, password = DEMO_PASSWORD) {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail address').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

export async function screenshot(page: Page, name: string) {
  mkdirSync(SCREENSHOTS, { recursive: true });
  await page.screenshot({ path: path.join(SCREENSHOTS, `${name}.png`), fullPage: true });
}
