import { describe, expect, it } from 'vitest';
import { inject } from 'vitest';
import { openBrowser, screenshot } from '../helpers/browser';

interface CaughtMail { subject: string; text: string; to: { address: string }[] }

async function waitForMail(address: string, subject: string): Promise<CaughtMail> {
  const deadline = Date.now() + 30_000;
  while (Date.now() < deadline) {
    const all = (await (await fetch(`http://127.0.0.1:${inject('maildevWebPort')}/api/email`)).json()) as CaughtMail[];
    const found = all.find((m) => m.subject === subject && m.to.some((t) => t.address === address));
    if (found) return found;
    await new Promise((r) => setTimeout(r, 500));
  }
  throw new Error(`No "${subject}" message reached ${address} within 30 s`);
}

describe('accounts', () => {
  it('registers a new account, then resets its password through the e-mailed link', async () => {
    const browser = await openBrowser('desktop');
    const { page } = browser;
    try {
      const email = `newcomer-${Date.now()}@example.org`;
      await page.goto('/register');
      await page.getByLabel('Your name').fill('Nia Newcomer');
      await page.getByLabel('E-mail').fill(email);
      await page.getByLabel('Password', { exact: true }).fill('first-password-1');
      await page.getByRole('button', { name: 'Create account' }).click();
      // A new account has no group yet, so the first-run page asks for one.
      await page.getByLabel('Group name').waitFor();
      await screenshot(page, 'desktop-first-run');

      await page.goto('/account');
      await page.getByRole('button', { name: 'Sign out' }).click();
      await page.waitForURL(/\/sign-in/);

      await page.goto('/forgot-password');
      await page.getByLabel('E-mail').fill(email);
      await page.getByRole('button', { name: 'Send the link' }).click();
      const mail = await waitForMail(email, 'Reset your Spurwood password');
      const link = mail.text.match(/http\S+\/reset-password\?token=\S+/)?.[0];
      expect(link).toBeTruthy();

      await page.goto(link!);
      await page.getByLabel('New password').fill('second-password-2');
      await page.getByRole('button', { name: 'Save new password' }).click();
      await page.waitForURL(/\/sign-in/);
      await page.getByLabel('E-mail').fill(email);
      await page.getByLabel('Password', { exact: true }).fill('second-password-2');
      await page.getByRole('button', { name: 'Sign in' }).click();
      await page.getByLabel('Group name').waitFor();
    } finally {
      await browser.close();
    }
  });
});
