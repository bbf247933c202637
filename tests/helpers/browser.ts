// Debian's Chromium driven by playwright-core (never a downloaded browser). Each test gets a new,
// empty profile so no cookie or storage leaks between journeys.
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { inject, onTestFailed } from 'vitest';
import { repoRoot } from '../../scripts/lib/processes';

export const viewports = {
  desktop: { width: 1280, height: 800 },
  phone: { width: 390, height: 844 },
} as const;

const screenshotDir = path.join(repoRoot, 'test-artifacts', 'screenshots');

export interface Browser { context: BrowserContext; page: Page; close(): Promise<void> }

export async function openBrowser(viewport: keyof typeof viewports = 'desktop'): Promise<Browser> {
  const profile = fs.mkdtempSync(path.join(os.tmpdir(), 'spurwood-chromium-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    viewport: viewports[viewport],
    baseURL: inject('baseUrl'),
    args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
  const page = context.pages()[0] ?? (await context.newPage());
  // A failing journey leaves a picture of where it stopped, next to the other screenshots.
  onTestFailed(async ({ task }) => {
    await screenshot(page, `failed-${task.name.replace(/\W+/g, '-').slice(0, 60)}`).catch(() => {});
  });
  return {
    context,
    page,
    close: async () => {
      await context.close();
      fs.rmSync(profile, { recursive: true, force: true });
    },
  };
}

export async function screenshot(page: Page, name: string): Promise<void> {
  fs.mkdirSync(screenshotDir, { recursive: true });
  await page.screenshot({ path: path.join(screenshotDir, `${name}.png`), fullPage: true });
}

export async function signIn(page: Page, email: string, password = 'orchard-demo'): Promise<void> {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));
}
