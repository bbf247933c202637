import { afterEach, describe, expect, it } from 'vitest';
import { openBrowser, screenshot, signIn, type Browser } from '../helpers/browser';

let browser: Browser | null = null;
afterEach(async () => {
  await browser?.close();
  browser = null;
});

// A season in °F with day-first dates, as a spreadsheet from a garden logger might save it; 2024 is
// a season the demo has no readings for.
function season2024(): Buffer {
  const lines = ['Date,Low (°F),High (°F),Rain (mm)'];
  for (let i = 0; i < 366; i++) {
    const date = new Date(Date.UTC(2024, 0, 1 + i));
    const dmy = `${String(date.getUTCDate()).padStart(2, '0')}/${String(date.getUTCMonth() + 1).padStart(2, '0')}/2024`;
    const mean = 50 + 13 * Math.sin((2 * Math.PI * (i - 110)) / 365);
    lines.push(`${dmy},${(mean - 7).toFixed(1)},${(mean + 7).toFixed(1)},${i % 3 ? 0 : 1.6}`);
  }
  return Buffer.from(lines.join('\n'));
}

async function openSite(page: Browser['page'], name: string) {
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Sites' }).click();
  await page.getByText(name).first().click();
  await page.getByRole('heading', { name: 'Temperatures' }).waitFor();
}

describe('temperatures on the site page', () => {
  it('lets the grower upload a season of readings: preview, import, and the chart for that season', async () => {
    browser = await openBrowser('desktop');
    const { page } = browser;
    await signIn(page, 'grower@example.org');
    await openSite(page, 'The Walled Garden');
    await page.getByRole('img', { name: /running degree-days/ }).waitFor();
    await screenshot(page, 'desktop-site-temperatures');

    await page.getByRole('button', { name: 'Upload CSV' }).click();
    const dialog = page.getByRole('dialog', { name: /Upload readings/ });
    await dialog.getByLabel('CSV file of readings').setInputFiles({ name: 'logger-2024.csv', mimeType: 'text/csv', buffer: season2024() });
    await dialog.getByText('366 rows').waitFor();
    await dialog.getByText('All can be imported.').waitFor();
    await dialog.getByRole('button', { name: 'Columns, unit and dates' }).click();
    expect(await dialog.getByRole('button', { name: '°F' }).getAttribute('aria-pressed')).toBe('true');
    await expect.poll(() => dialog.getByRole('table', { name: 'Rows read from the file' }).getByRole('row').count()).toBeGreaterThan(10);
    await screenshot(page, 'desktop-upload-preview');

    await dialog.getByRole('button', { name: 'Import 366 days' }).click();
    await dialog.waitFor({ state: 'hidden' });
    await page.getByText('366 days imported').waitFor();

    await page.getByRole('combobox', { name: 'Season' }).click();
    await page.getByRole('option', { name: '2024', exact: true }).click();
    const chart = page.getByRole('img', { name: /running degree-days/ });
    await chart.waitFor();
    await page.getByText(/By 31 Dec 2024: [\d,]+ degree-days above 5 °C/).waitFor();
    await page.getByText('No missing days this season.').waitFor();
    // The table follows the season once its readings arrive, a moment after the chart.
    await page.getByRole('table', { name: 'Daily readings' }).getByText('31 Dec 2024').waitFor();
    await screenshot(page, 'desktop-site-season-2024');
  }, 90_000); // a full journey with two uploads: slower than most on a busy machine

  it('refuses a file that is not CSV with a clear message', async () => {
    browser = await openBrowser('desktop');
    const { page } = browser;
    await signIn(page, 'owner@example.org');
    await openSite(page, 'The Walled Garden');
    await page.getByRole('button', { name: 'Upload CSV' }).click();
    const dialog = page.getByRole('dialog', { name: /Upload readings/ });
    await dialog.getByLabel('CSV file of readings').setInputFiles({ name: 'weather.xlsx', mimeType: 'application/octet-stream', buffer: Buffer.from([0x50, 0x4b, 0x03, 0x04, 0x14, 0, 6, 0]) });
    await dialog.getByText(/spreadsheet workbook .* not CSV/).waitFor();
    expect(await dialog.getByRole('button', { name: /^Import/ }).isDisabled()).toBe(true);
  });

  it('shows the helper the chart and readings without the controls to change them, on a phone', async () => {
    browser = await openBrowser('phone');
    const { page } = browser;
    await signIn(page, 'helper@example.org');
    await openSite(page, 'Plot 14, Sallow Lane Allotments');
    // The demo's readings run to the day before it was loaded, with a four-day logger gap in August
    // 2026; how many days are missing this season depends on the date, so ask the server the page reads.
    const siteId = new URL(page.url()).pathname.split('/').pop();
    const [group] = await (await page.request.get('/api/groups')).json();
    const weather = await (await page.request.get(`/api/groups/${group.id}/sites/${siteId}/weather`)).json();
    const count: number = weather.missing.count;
    await page.getByText(count ? new RegExp(`${count} days? missing this season`) : /No missing days this season/).waitFor();
    await page.getByRole('img', { name: /winter's chill/ }).waitFor();
    expect(await page.getByRole('button', { name: 'Upload CSV' }).count()).toBe(0);
    expect(await page.getByRole('button', { name: /^Delete / }).count()).toBe(0);
    await screenshot(page, 'phone-site-temperatures');
  });
});
