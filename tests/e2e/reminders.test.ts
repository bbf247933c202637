import { afterEach, describe, expect, it } from 'vitest';
import { openBrowser, screenshot, signIn, type Browser } from '../helpers/browser';

let browser: Browser | null = null;
afterEach(async () => {
  await browser?.close();
  browser = null;
});

describe('reminders', () => {
  it('an owner sets how far ahead to hear, makes a calendar address and sees the worker at work, on a phone', async () => {
    browser = await openBrowser('phone');
    const { page } = browser;
    await signIn(page, 'owner@example.org');
    await page.goto('/account');
    await page.getByRole('link', { name: 'Reminder e-mails and calendar' }).click();
    await page.getByRole('heading', { name: 'Reminder e-mails' }).waitFor();

    await page.getByLabel('Days of notice before a window opens').fill('5');
    await page.getByRole('button', { name: 'Save reminder settings' }).click();
    await page.getByText('Reminder settings saved').waitFor();

    await page.getByRole('button', { name: 'Make my calendar address' }).click();
    const address = page.getByLabel('Calendar address');
    await expect.poll(() => address.inputValue()).toMatch(/\/api\/calendar\/[\w-]{43}\.ics$/);
    const feed = await page.request.get(new URL(await address.inputValue()).pathname);
    expect(feed.status()).toBe(200);
    expect(await feed.text()).toContain('BEGIN:VCALENDAR');
    await screenshot(page, 'phone-reminder-settings');

    await page.reload();
    await expect.poll(() => page.getByLabel('Days of notice before a window opens').inputValue()).toBe('5');

    await page.goto('/account');
    await page.getByRole('link', { name: 'Reminder worker' }).click();
    await page.getByRole('heading', { name: 'Daily pass by site' }).waitFor();
    await page.getByText('The Walled Garden').waitFor();
    await page.getByText('Plot 14, Sallow Lane Allotments').waitFor();
    await screenshot(page, 'phone-reminder-worker');
  });
});
