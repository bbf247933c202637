import { Jimp } from 'jimp';
import { afterEach, describe, expect, it } from 'vitest';
import { openBrowser, screenshot, signIn, type Browser } from '../helpers/browser';

let browser: Browser | null = null;
afterEach(async () => {
  await browser?.close();
  browser = null;
});

// Days in last year, so the journey never depends on today's season and never logs a future day.
const lastYear = new Date().getFullYear() - 1;
const winterDay = `${lastYear}-12-01`;
const summerDay = `${lastYear}-07-20`;

describe('logging work at the plant on a phone', () => {
  it('logs a summer prune on a plum with a photo: the check speaks first, then the entry shows in the history', async () => {
    browser = await openBrowser('phone');
    const { page } = browser;
    await signIn(page, 'grower@example.org');
    await page.goto('/plants?search=Victoria');
    await page.getByRole('link', { name: 'Victoria' }).first().click();
    await page.getByRole('heading', { name: 'Victoria' }).waitFor();
    await page.getByRole('button', { name: 'Log work' }).click();

    const dialog = page.getByRole('dialog', { name: 'Log work' });
    await dialog.getByRole('radio', { name: 'Prune' }).click();
    await dialog.getByText('Summer', { exact: true }).click();
    // A winter day: the stone-fruit check says to avoid the cut and asks why before it can be saved.
    await dialog.getByLabel('Date').fill(winterDay);
    await dialog.getByText('Avoid cutting').first().waitFor();
    await dialog.getByLabel('Why cut now?').waitFor();
    expect(await dialog.getByRole('button', { name: 'Save to log' }).isDisabled()).toBe(true);
    await screenshot(page, 'phone-log-avoid');

    // The day it was really done, in July: the check is happy and asks nothing.
    await dialog.getByLabel('Date').fill(summerDay);
    await dialog.getByText('OK to cut').first().waitFor();
    expect(await dialog.getByLabel('Why cut now?').count()).toBe(0);
    const photo = await new Jimp({ width: 320, height: 240, color: 0x3f5d2aff }).getBuffer('image/jpeg', { quality: 80 });
    await dialog.getByLabel('Photo', { exact: true }).setInputFiles({ name: 'victoria-after.jpg', mimeType: 'image/jpeg', buffer: photo });
    await dialog.getByRole('img', { name: /victoria-after\.jpg/ }).waitFor();
    await screenshot(page, 'phone-log-form');
    await dialog.getByRole('button', { name: 'Save to log' }).click();
    await dialog.waitFor({ state: 'hidden' });

    const history = page.getByRole('region', { name: 'Work log' });
    const entry = history.getByRole('article').first();
    await entry.getByText('Summer prune').waitFor();
    await entry.getByText('OK to cut').waitFor();
    await entry.getByText('Tobias Wren').waitFor();
    const thumb = entry.getByRole('img', { name: /photo 1/ });
    // Thumbnails load lazily: bring the entry into view, then the picture must arrive whole.
    await thumb.scrollIntoViewIfNeeded();
    await expect.poll(() => thumb.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth > 0), { timeout: 15_000 }).toBe(true);
    await screenshot(page, 'phone-log-history');
  });
});
