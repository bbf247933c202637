import { QueryTypes } from 'sequelize';
import { beforeEach, describe, expect, it } from 'vitest';
import { cautionsFor, daylight, planLadder } from '../../server/care';
import { sequelize } from '../../server/db';
import { CareWindow, OutboxMessage, Plant, ReminderPreference, Site } from '../../server/models';
import * as dailyPass from '../../worker/jobs/run-daily-pass';
import { deliverQueuedMail } from '../helpers/mail';
import { resetDatabase } from '../helpers/api';
import { APP_URL, DAY, inboxes, orchard, passAndDeliver } from './reminder-fixtures';

beforeEach(resetDatabase);

const count = async (sql: string) => Number((await sequelize.query<{ n: string }>(sql, { type: QueryTypes.SELECT }))[0]!.n);

describe('the daily pass', () => {
  it('sends each member one digest with the jobs that are due, their cautions and the site\'s sunset time', async () => {
    const { emails, fig, raspberry, plum } = await orchard();
    const pass = await passAndDeliver();
    expect(pass).toMatchObject({ dates: [DAY], sites: 1, failed: 0, digests: 2 });

    // The engine's own answers for this site and day are what the mail must carry.
    const light = daylight(52.4, -1.9, DAY, 'Europe/London');
    const sunset = light.sunset!.slice(11, 16);
    const finishBy = light.finishLadderWorkBy!.slice(11, 16);
    const ladder = planLadder(2.6);
    const lineCaution = cautionsFor({ task: 'prune', heightM: 0.6, hazards: ['overhead-lines'], month: 6, country: 'UK' }).find((c) => c.code === 'R-PL4')!;

    for (const [email, mails] of await inboxes(emails)) {
      expect(mails, email).toHaveLength(1);
      const [mail] = mails as [(typeof mails)[number]];
      expect(mail.subject).toBe('Spurwood for Wednesday 24 June: 2 jobs to plan');
      for (const part of [mail.text, mail.html]) {
        expect(part).toContain('Summer pruning');
        expect(part).toContain('Closing: the window ends Tuesday 30 June');
        expect(part).toContain('Picking the crop');
        expect(part).toContain('Opens Thursday 25 June');
        expect(part).toContain(`Sunset today ${sunset}`);
        expect(part).toContain(`Finish ladder work by ${finishBy}`);
        expect(part).toContain(`set the foot ${ladder.footDistanceM.toFixed(2)} m out`);
        expect(part).toContain(`longer than ${ladder.ladderLengthM.toFixed(2)} m`);
        expect(part).toContain('secateurs');
        expect(part).toContain(lineCaution.text.replace(/'/g, part === mail.html ? '&#39;' : "'"));
        expect(part).toContain(`${APP_URL}/plants/${fig.id}`);
        expect(part).toContain(`${APP_URL}/plants/${raspberry.id}`);
        expect(part).not.toContain(plum.id);
        expect(part).toContain('qualified arborist');
        expect(part).toContain(`${APP_URL}/unsubscribe/`);
      }
    }
    expect(await count(`SELECT count(*) AS n FROM reminder_deliveries WHERE digest_key LIKE 'digest:%'`)).toBe(4);
    expect(await OutboxMessage.count({ where: { status: 'sent' } })).toBe(2);
  });

  it('stores every plant\'s windows, and a second pass for the same date sends nothing new', async () => {
    const { emails, plum } = await orchard();
    await passAndDeliver();
    const stored = await CareWindow.count();
    expect(await CareWindow.count({ where: { plantId: plum.id, season: 2026 } })).toBeGreaterThan(0);
    const second = await passAndDeliver();
    expect(second).toMatchObject({ sites: 0, digests: 0 });
    for (const mails of (await inboxes(emails)).values()) expect(mails).toHaveLength(1);
    expect(await CareWindow.count()).toBe(stored);
    expect(await OutboxMessage.count()).toBe(2);
  });

  it('sends nothing the next day for jobs it has already announced', async () => {
    const { emails } = await orchard();
    await passAndDeliver('2026-06-24');
    const next = await passAndDeliver('2026-06-25');
    expect(next).toMatchObject({ sites: 1, digests: 0 });
    for (const mails of (await inboxes(emails)).values()) expect(mails).toHaveLength(1);
  });

  it('adds each group\'s list of the week\'s jobs on a Monday', async () => {
    const { emails, plum } = await orchard({ people: 1 });
    await passAndDeliver('2026-06-29');
    const [mail] = (await inboxes(emails)).get(emails[0]!)!;
    expect(mail!.subject).toContain('and this week\u2019s list');
    expect(mail!.text).toContain('== This week in Brook Lane Orchard ==');
    expect(mail!.text).toContain(`'Victoria' plum, Lower field`);
    expect(mail!.text).toContain(`${APP_URL}/plants/${plum.id}`);
  });

  it('leaves out a job someone has marked done', async () => {
    const { emails, fig } = await orchard({ people: 1 });
    await passAndDeliver('2026-06-01');
    await CareWindow.update({ doneAt: new Date() }, { where: { plantId: fig.id, task: 'summer-prune' } });
    await passAndDeliver();
    const mails = (await inboxes(emails)).get(emails[0]!)!;
    const today = mails.find((m) => m.subject.includes('24 June'))!;
    expect(today.text).toContain('Picking the crop');
    expect(today.text).not.toContain('Summer pruning');
  });

  it('follows each person\'s preferences: paused, closing reminders off, only some tasks', async () => {
    const { people } = await orchard({ people: 3 });
    const [paused, noClosing, harvestOnly] = people as [typeof people[number], typeof people[number], typeof people[number]];
    await ReminderPreference.create({ userId: paused.id, pausedUntil: '2026-06-24', tasks: null, calendarTokenHash: null, calendarNonce: null, calendarCreatedAt: null });
    await ReminderPreference.create({ userId: noClosing.id, isClosingOn: false, tasks: null, pausedUntil: null, calendarTokenHash: null, calendarNonce: null, calendarCreatedAt: null });
    await ReminderPreference.create({ userId: harvestOnly.id, tasks: ['summer-prune'], pausedUntil: null, calendarTokenHash: null, calendarNonce: null, calendarCreatedAt: null });
    await passAndDeliver();
    const boxes = await inboxes(people.map((p) => p.email));
    expect(boxes.get(paused.email)).toHaveLength(0);
    expect(boxes.get(noClosing.email)![0]!.text).not.toContain('Summer pruning');
    expect(boxes.get(noClosing.email)![0]!.text).toContain('Picking the crop');
    expect(boxes.get(harvestOnly.email)![0]!.text).toContain('Summer pruning');
    expect(boxes.get(harvestOnly.email)![0]!.text).not.toContain('Picking the crop');
  });

  it('records a site whose pass fails and still passes the others', async () => {
    const { site } = await orchard({ people: 1 });
    const other = await Site.create({ groupId: site.groupId, name: 'Upper field', latitude: 52.5, longitude: -1.8, elevationM: null, timeZone: 'Europe/London', hazards: [], notes: '', archivedAt: null });
    await sequelize.query(`INSERT INTO plants (group_id, site_id, type_code, form) VALUES ($1, $2, 'banana', 'bush')`, { bind: [site.groupId, other.id] });
    const pass = await passAndDeliver();
    expect(pass).toMatchObject({ sites: 2, failed: 1 });
    const rows = await sequelize.query<{ site_id: string; status: string; error: string | null }>('SELECT site_id, status, error FROM site_passes', { type: QueryTypes.SELECT });
    expect(rows.find((r) => r.site_id === other.id)).toMatchObject({ status: 'failed' });
    expect(rows.find((r) => r.site_id === site.id)).toMatchObject({ status: 'done', error: null });
  });

  it('runs each site once its own day has passed 06:00, and never sends anyone two digests on one day', async () => {
    const { site, emails, group } = await orchard({ people: 1 });
    const newYork = await Site.create({ groupId: group.id, name: 'Hudson plot', latitude: 41.7, longitude: -73.9, elevationM: null, timeZone: 'America/New_York', hazards: [], notes: '', archivedAt: null });
    await Plant.create({ groupId: group.id, siteId: newYork.id, typeCode: 'fig', cultivar: 'Chicago Hardy', rootstock: '', form: 'bush', plantedYear: 2015, heightM: 2.0, positionLabel: 'By the porch', healthFlags: [], notes: '', archivedAt: null });
    const tick = async (iso: string) => {
      const result = await dailyPass.run({ db: sequelize, links: { appUrl: APP_URL }, now: () => new Date(iso) });
      await deliverQueuedMail();
      return result;
    };
    const passes = async () => (await sequelize.query<{ site_id: string; date: string }>(`SELECT site_id, to_char(date, 'YYYY-MM-DD') AS date FROM site_passes ORDER BY date, site_id`, { type: QueryTypes.SELECT }));

    // 05:30 UTC is 06:30 in London (summer time) and 01:30 in New York.
    expect(await tick('2026-06-24T04:30:00Z')).toMatchObject({ sites: 0 });
    expect(await tick('2026-06-24T05:30:00Z')).toMatchObject({ sites: 1, digests: 1 });
    expect(await passes()).toEqual([{ site_id: site.id, date: '2026-06-24' }]);
    // New York reaches 06:00 at 10:00 UTC; its jobs must wait, because today's digest has gone.
    expect(await tick('2026-06-24T10:30:00Z')).toMatchObject({ sites: 1, digests: 0 });
    expect(await tick('2026-06-24T11:30:00Z')).toMatchObject({ sites: 0, digests: 0 });
    let mails = (await inboxes(emails)).get(emails[0]!)!;
    expect(mails).toHaveLength(1);
    expect(mails[0]!.text).not.toContain('Chicago Hardy');
    // The next morning in London brings them, in the next day's single digest.
    expect(await tick('2026-06-25T05:30:00Z')).toMatchObject({ sites: 1, digests: 1 });
    mails = (await inboxes(emails)).get(emails[0]!)!;
    expect(mails).toHaveLength(2);
    expect(mails.find((m) => m.subject.includes('25 June'))!.text).toContain('Chicago Hardy');
    expect(await OutboxMessage.count()).toBe(2);
  });
});

