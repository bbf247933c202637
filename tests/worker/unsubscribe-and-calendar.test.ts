import ICAL from 'ical.js';
import { beforeEach, describe, expect, it } from 'vitest';
import { sequelize } from '../../server/db';
import { CareWindow, ReminderPreference, type User } from '../../server/models';
import { hashPassword } from '../../server/services/account.service';
import { newClient, PASSWORD, resetDatabase, signedIn } from '../helpers/api';
import { DAY, inboxes, orchard, passAndDeliver } from './reminder-fixtures';

beforeEach(resetDatabase);

async function withPasswords(users: User[]) {
  for (const user of users) await user.update({ passwordHash: await hashPassword(PASSWORD) });
}

const unsubscribePath = (text: string) => /http:\/\/127\.0\.0\.1:3999(\/unsubscribe\/\S+)/.exec(text)![1]!;

describe('the one-click unsubscribe link', () => {
  it('turns reminders off, says so in a plain page, and stops the mails', async () => {
    const { emails, people } = await orchard();
    await passAndDeliver(DAY);
    const [first] = (await inboxes(emails)).get(emails[0]!)!;
    const page = await (await newClient()).agent.get(unsubscribePath(first!.text));
    expect(page.status).toBe(200);
    expect(page.headers['content-type']).toMatch(/text\/html/);
    expect(page.text).toContain('Reminders are off');
    expect((await ReminderPreference.findByPk(people[0]!.id))?.isEnabled).toBe(false);

    // A Monday brings both a weekly list and new reminders; only the person still subscribed gets them.
    await passAndDeliver('2026-06-29');
    const boxes = await inboxes(emails);
    expect(boxes.get(emails[0]!)).toHaveLength(1);
    expect(boxes.get(emails[1]!)).toHaveLength(2);
  });

  it('also answers the POST that mail programs send (RFC 8058)', async () => {
    const { emails, people } = await orchard({ people: 1 });
    await passAndDeliver(DAY);
    const [first] = (await inboxes(emails)).get(emails[0]!)!;
    await (await newClient()).agent.post(unsubscribePath(first!.text)).type('form').send('List-Unsubscribe=One-Click').expect(200);
    expect((await ReminderPreference.findByPk(people[0]!.id))?.isEnabled).toBe(false);
  });

  it('answers 404 with a plain page for a token that was tampered with, and changes nothing', async () => {
    const { emails, people } = await orchard({ people: 2 });
    await passAndDeliver(DAY);
    const [first] = (await inboxes(emails)).get(emails[0]!)!;
    // Someone else's id with the first person's signature.
    const forged = unsubscribePath(first!.text).replace(people[0]!.id, people[1]!.id);
    const page = await (await newClient()).agent.get(forged);
    expect(page.status).toBe(404);
    expect(page.text).toContain('This link does not work');
    expect(await ReminderPreference.count()).toBe(0);
  });
});

describe('GET /api/calendar/:token.ics', () => {
  it('serves the person\'s groups\' windows as valid RFC 5545 all-day events', async () => {
    const { people } = await orchard({ people: 1 });
    // The feed runs from a month back to a year ahead of the real today, so the pass is for today too.
    await passAndDeliver(new Date().toISOString().slice(0, 10));
    await withPasswords(people);
    const client = await signedIn(people[0]!.email);
    const { body } = await client.post('/api/reminders/calendar').expect(201);
    const path = new URL(body.url as string).pathname;
    const res = await (await newClient()).agent.get(path).buffer(true).parse((r, done) => { let t = ''; r.on('data', (c: Buffer) => (t += c.toString())); r.on('end', () => done(null, t)); });
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/calendar/);
    const calendar = new ICAL.Component(ICAL.parse(res.body as string));
    expect(calendar.getFirstPropertyValue('version')).toBe('2.0');
    expect(calendar.getFirstPropertyValue('prodid')).toBeTruthy();
    const events = calendar.getAllSubcomponents('vevent').map((v) => new ICAL.Event(v));
    const inRange = await CareWindow.findAll({ where: sequelize.literal('closes >= current_date - 31 AND opens <= current_date + 400'), include: ['plant'] });
    expect(inRange.length).toBeGreaterThan(0);
    expect(events.map((e) => e.uid).sort()).toEqual(inRange.map((w) => `${w.id}@spurwood`).sort());
    for (const window of inRange) {
      const event = events.find((e) => e.uid === `${window.id}@spurwood`)!;
      const plant = window.get('plant') as { cultivar: string };
      expect(event.summary).toMatch(new RegExp(`^[A-Z][^:]+: '${plant.cultivar}' `));
      expect(event.startDate.isDate).toBe(true);
      expect(event.startDate.toString()).toBe(window.opens);
      // DTEND of an all-day event is the day after the last day (RFC 5545 §3.6.1).
      const after = new Date(`${window.closes}T00:00:00Z`);
      after.setUTCDate(after.getUTCDate() + 1);
      expect(event.endDate.toString()).toBe(after.toISOString().slice(0, 10));
    }
  });

  it('answers 404 for a wrong token and for the old token after a new link is made', async () => {
    const { people } = await orchard({ people: 1 });
    await withPasswords(people);
    const client = await signedIn(people[0]!.email);
    const first = new URL((await client.post('/api/reminders/calendar').expect(201)).body.url as string).pathname;
    const anonymous = await newClient();
    await anonymous.agent.get(first).expect(200);
    await anonymous.agent.get('/api/calendar/not-a-real-token-at-all-not-a-real-token-00.ics').expect(404);
    const second = new URL((await client.post('/api/reminders/calendar').expect(201)).body.url as string).pathname;
    expect(second).not.toBe(first);
    const gone = await anonymous.agent.get(first);
    expect(gone.status).toBe(404);
    expect(gone.body.error.code).toBe('NOT_FOUND');
    await anonymous.agent.get(second).expect(200);
  });
});
