import pg from 'pg';
import { afterEach, describe, expect, inject, it } from 'vitest';
import { openBrowser, screenshot, signIn, type Browser } from '../helpers/browser';

const browsers: Browser[] = [];
afterEach(async () => {
  await Promise.all(browsers.splice(0).map((b) => b.close()));
});

const phone = async () => {
  const b = await openBrowser('phone');
  browsers.push(b);
  return b.page;
};

/** The invitation link from maildev, once the worker has delivered the message (it polls every 5 s). */
async function invitationLink(to: string): Promise<string> {
  const inbox = `http://127.0.0.1:${inject('maildevWebPort')}/api/email`;
  let link: string | undefined;
  await expect.poll(async () => {
    const mails = (await (await fetch(inbox)).json()) as { text: string; to: { address: string }[] }[];
    link = mails.filter((m) => m.to.some((t) => t.address === to)).map((m) => /https?:\/\/\S+\/invitations\/[\w-]+/.exec(m.text)?.[0]).find(Boolean);
    return link;
  }, { timeout: 30_000, interval: 1_000 }).toBeTruthy();
  return new URL(link!).pathname;
}

// No feed window is open in December (feeds fall in late winter and summer), and the e2e server runs
// on today's real date. So the journey stores one feed window for the 'Discovery' apple, open from
// three days ago for three weeks, straight into the database, as the worker's daily pass would write
// it. The pass has already run for today, so it will not tidy this window away during the test. No
// other journey logs work on that apple, so their plant histories stay as they expect.
async function openFeedWindowOnDiscovery(): Promise<void> {
  const db = new pg.Client({ connectionString: inject('e2eDatabaseUrl') });
  await db.connect();
  try {
    const source = 'end-to-end test';
    const reason = 'Set up by the team journey: no feed window is open in December';
    await db.query(`
      WITH wording AS (
        INSERT INTO care_window_wordings (id, source, reason) VALUES (care_window_wording_id($1, $2, NULL), $1, $2)
        ON CONFLICT (id) DO UPDATE SET source = EXCLUDED.source RETURNING id)
      INSERT INTO care_windows (plant_id, group_id, site_id, season, task, rule_key, opens, closes, basis, wording_id)
      SELECT p.id, p.group_id, p.site_id, extract(year FROM current_date)::int, 'spring-feed', 'e2e-feed', current_date - 3, current_date + 21, 'calendar', wording.id
      FROM plants p, wording WHERE p.cultivar = 'Discovery'
      ON CONFLICT (id) DO UPDATE SET done_at = NULL, done_by = NULL, assigned_to = NULL`, [source, reason]);
  } finally {
    await db.end();
  }
}

describe('sharing out the work', () => {
  it('owner invites a helper, who joins from the e-mail, is handed an open feed and ticks it off from "My jobs"', async () => {
    await openFeedWindowOnDiscovery();
    const email = `new-helper-${Date.now()}@example.org`;

    // The owner invites someone new as a helper.
    const owner = await phone();
    await signIn(owner, 'owner@example.org');
    await owner.goto('/members');
    await owner.getByLabel('E-mail address').fill(email);
    await owner.getByRole('button', { name: 'Send invitation' }).click();
    await owner.getByRole('list', { name: 'Invitations waiting' }).getByText(email).waitFor();
    await screenshot(owner, 'phone-team-invite');

    // The helper opens the link in their own browser, makes an account and lands on their jobs.
    const helper = await phone();
    await helper.goto(await invitationLink(email));
    await helper.getByText('Maren Hollis invited you to Hollin Vale Community Orchard.').waitFor();
    await helper.getByLabel('Your name').fill('Ivy Marsh');
    await helper.getByLabel('Password', { exact: true }).fill('pruning-saw-42');
    await screenshot(helper, 'phone-team-accept');
    await helper.getByRole('button', { name: 'Join Hollin Vale Community Orchard' }).click();
    await helper.waitForURL((u) => u.pathname === '/jobs');
    await helper.getByText('Nothing handed to you yet').waitFor();

    // The owner hands the open feed to the new helper.
    await owner.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Jobs' }).click();
    const week = owner.getByRole('region', { name: /Open this week/ });
    await week.getByRole('article').first().waitFor();
    // The list starts with the soonest-closing jobs; the rest are a tap away.
    if (await week.getByRole('button', { name: /^Show all/ }).count()) await week.getByRole('button', { name: /^Show all/ }).click();
    const who = owner.getByRole('combobox', { name: 'Who does spring feed on Discovery apple' });
    await who.click();
    await owner.getByRole('option', { name: 'Ivy Marsh' }).click();
    await owner.getByText('Handed to Ivy Marsh').waitFor();
    await screenshot(owner, 'phone-team-assigned');

    // The helper sees it under "My jobs", open, and ticks it off with what went on.
    await helper.reload();
    const mine = helper.getByRole('region', { name: 'My jobs' });
    const job = mine.getByRole('article', { name: 'Spring feed: Discovery apple' });
    await job.getByText('Open', { exact: true }).waitFor();
    await screenshot(helper, 'phone-team-my-jobs');
    await job.getByRole('button', { name: 'Done: spring feed on Discovery apple' }).click();
    const dialog = helper.getByRole('dialog', { name: 'Spring feed: Discovery apple' });
    await dialog.getByLabel('Feed').fill('Growmore');
    await dialog.getByLabel('Amount').fill('140');
    await screenshot(helper, 'phone-team-done');
    await dialog.getByRole('button', { name: 'Log it as done' }).click();
    await dialog.waitFor({ state: 'hidden' });
    await mine.getByText('Nothing handed to you yet').waitFor();

    // The work log has it, done by the helper.
    await helper.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Log' }).click();
    const log = helper.getByRole('table', { name: 'Work log' });
    await log.getByText(/Growmore/).first().waitFor();
    expect(await log.getByText('Ivy Marsh').count()).toBeGreaterThan(0);
    await screenshot(helper, 'phone-team-log');
  });
});
