import { QueryTypes } from 'sequelize';
import { beforeEach, describe, expect, it } from 'vitest';
import { sequelize } from '../../server/db';
import { CareWindow, Plant, Site } from '../../server/models';
import * as dailyPass from '../../worker/jobs/run-daily-pass';
import { resetDatabase } from '../helpers/api';
import { deliverQueuedMail } from '../helpers/mail';
import { APP_URL, inboxes, orchard } from './reminder-fixtures';

// The pass runs its batches of sites two at a time, and keys each window by plant, season and rule.
// These cases run it with one site to a batch, so the lanes really do overlap.

beforeEach(resetDatabase);

async function passInSmallBatches(date: string) {
  const pass = await dailyPass.run({ db: sequelize, links: { appUrl: APP_URL }, date, batchSize: 1, lanes: 2 });
  let round;
  do round = await deliverQueuedMail();
  while (round.claimed > 0);
  return pass;
}

const windowsOf = (plantId: string) => CareWindow.findAll({ where: { plantId }, order: [['id', 'ASC']], raw: true });

describe('batches of sites side by side', () => {
  it('gives a group spread over six sites one weekly list per person on a Monday, however the batches meet', async () => {
    const { group, emails } = await orchard({ people: 3 });
    for (let i = 0; i < 5; i += 1) {
      const site = await Site.create({ groupId: group.id, name: `Allotment ${i}`, latitude: 52.4, longitude: -1.9, elevationM: null, timeZone: 'Europe/London', hazards: [], notes: '', archivedAt: null });
      await Plant.create({ groupId: group.id, siteId: site.id, typeCode: 'apple', cultivar: `Tree ${i}`, rootstock: '', form: 'cordon', plantedYear: 2015, heightM: 1.8, positionLabel: `Bed ${i}`, healthFlags: [], notes: '', archivedAt: null });
    }
    const pass = await passInSmallBatches('2026-06-29');
    expect(pass).toMatchObject({ sites: 6, failed: 0, digests: 3 });
    const weekly = await sequelize.query<{ n: string }>(`SELECT count(*) AS n FROM reminder_deliveries WHERE kind = 'weekly'`, { type: QueryTypes.SELECT });
    expect(Number(weekly[0]!.n)).toBe(3);
    for (const [email, mails] of await inboxes(emails)) {
      expect(mails, email).toHaveLength(1);
      expect(mails[0]!.text.match(/== This week in Brook Lane Orchard ==/g), email).toHaveLength(1);
    }
  });

  it('moves a plant\'s windows with it to another site, keeping their ids and what was done', async () => {
    const { group, fig } = await orchard({ people: 1 });
    await passInSmallBatches('2026-06-01');
    const before = await windowsOf(fig.id);
    const prune = before.find((w) => w.task === 'summer-prune')!;
    await CareWindow.update({ doneAt: new Date('2026-06-01T10:00:00Z') }, { where: { id: prune.id } });

    const yard = await Site.create({ groupId: group.id, name: 'Back yard', latitude: 52.4, longitude: -1.9, elevationM: null, timeZone: 'Europe/London', hazards: [], notes: '', archivedAt: null });
    await fig.update({ siteId: yard.id });
    await passInSmallBatches('2026-06-02');

    const after = await windowsOf(fig.id);
    expect(after.map((w) => w.id)).toEqual(before.map((w) => w.id));
    expect(new Set(after.map((w) => w.siteId))).toEqual(new Set([yard.id]));
    expect(after.find((w) => w.id === prune.id)!.doneAt).not.toBeNull();
  });
});
