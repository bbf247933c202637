import { afterEach, describe, expect, it } from 'vitest';
import { openBrowser, screenshot, signIn, type Browser } from '../helpers/browser';

let browser: Browser | null = null;
afterEach(async () => {
  await browser?.close();
  browser = null;
});

// PrimeVue's Select is a combobox labelled by its field label; its options open in an overlay.
async function choose(page: Browser['page'], label: string, option: string) {
  await page.getByRole('dialog').getByRole('combobox', { name: label }).click();
  await page.getByRole('option', { name: option, exact: true }).click();
}

describe('the register of plants', () => {
  it('lets the owner add a plant: a validation error first, then the plant is found in the table', async () => {
    browser = await openBrowser('desktop');
    const { page } = browser;
    await signIn(page, 'owner@example.org');
    const table = page.getByRole('table', { name: 'Plants' });
    await table.getByText('Egremont Russet').waitFor();
    await screenshot(page, 'desktop-plants');

    await page.getByRole('button', { name: 'Add plant' }).first().click();
    const dialog = page.getByRole('dialog');
    await dialog.getByRole('button', { name: 'Add plant' }).click();
    await dialog.getByText('Choose what kind of plant it is').waitFor();
    await dialog.getByText('Choose how it is grown or trained').waitFor();
    await screenshot(page, 'desktop-plant-form-errors');

    await choose(page, 'Site', 'The Walled Garden');
    await choose(page, 'Type', 'Quince');
    await choose(page, 'Form', 'Bush');
    await dialog.getByLabel('Cultivar').fill('Vranja');
    await dialog.getByLabel('Height (m)').fill('2.4');
    await dialog.getByRole('button', { name: 'Add plant' }).click();
    await dialog.waitFor({ state: 'hidden' });

    await page.getByLabel('Search').fill('Vranja');
    await table.getByText('Vranja').waitFor();
    expect(await table.getByRole('row').count()).toBe(2); // the header row and the new quince
    expect(await table.getByText('Egremont Russet').count()).toBe(0);
  });

  it('shows the viewer the plants without any edit controls', async () => {
    browser = await openBrowser('desktop');
    const { page } = browser;
    await signIn(page, 'viewer@example.org');
    await page.getByRole('table', { name: 'Plants' }).getByText('Egremont Russet').waitFor();
    expect(await page.getByRole('button', { name: 'Add plant' }).count()).toBe(0);
    expect(await page.getByRole('button', { name: /^(Edit|Archive) / }).count()).toBe(0);
    await page.getByRole('table', { name: 'Plants' }).getByText('Egremont Russet').click();
    await page.getByRole('heading', { name: /Egremont Russet/ }).waitFor();
    expect(await page.getByRole('button', { name: /Edit|Archive/ }).count()).toBe(0);
  });
});

describe('on a phone', () => {
  it('shows the plants, the form and the sites at 390×844', async () => {
    browser = await openBrowser('phone');
    const { page } = browser;
    await page.goto('/sign-in');
    await page.getByRole('button', { name: 'Sign in' }).waitFor();
    await screenshot(page, 'phone-sign-in');
    await signIn(page, 'grower@example.org');
    await page.getByText('Egremont Russet').first().waitFor();
    await screenshot(page, 'phone-plants');
    await page.getByRole('button', { name: 'Add plant' }).first().click();
    await page.getByRole('dialog').getByRole('button', { name: 'Add plant' }).click();
    await page.getByText('Choose what kind of plant it is').waitFor();
    await screenshot(page, 'phone-plant-form-errors');
    await page.keyboard.press('Escape');
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Sites' }).click();
    await page.getByText('Plot 14, Sallow Lane Allotments').first().waitFor();
    await screenshot(page, 'phone-sites');
  });
});
