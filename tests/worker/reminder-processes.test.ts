// The worker as real processes: two at once, one killed mid-pass, the mail server down, a clean stop.
// Each test uses its own addresses, because every test file shares one maildev.
import { spawn } from 'node:child_process';
import { QueryTypes } from 'sequelize';
import { beforeEach, describe, expect, it } from 'vitest';
import { inject } from 'vitest';
import { freePort } from '../../scripts/lib/free-port';
import { repoRoot } from '../../scripts/lib/processes';
import { sequelize } from '../../server/db';
import { OutboxMessage, Plant, Site } from '../../server/models';
import * as deliverOutbox from '../../worker/jobs/deliver-outbox';
import * as dailyPass from '../../worker/jobs/run-daily-pass';
import { createMailer } from '../../worker/mailer';
import { resetDatabase } from '../helpers/api';
import { APP_URL, DAY, inboxes, orchard, spawnOnce } from './reminder-fixtures';

beforeEach(resetDatabase);

/** The orchard plus `extra` more sites with the same three plants, so a pass has several batches. */
async function biggerOrchard(extra: number, people = 3) {
  const base = await orchard({ people });
  for (let i = 0; i < extra; i += 1) {
    const site = await Site.create({ groupId: base.group.id, name: `Plot ${i + 1}`, latitude: 52.4, longitude: -1.9, elevationM: null, timeZone: 'Europe/London', hazards: [], notes: '', archivedAt: null });
    for (const plant of [base.fig, base.raspberry, base.plum]) {
      await Plant.create({ ...plant.get({ plain: true }), id: undefined, siteId: site.id, positionLabel: `${plant.positionLabel}, plot ${i + 1}` } as never);
    }
  }
  return base;
}

const sitePasses = async () => Number((await sequelize.query<{ n: string }>(`SELECT count(*) AS n FROM site_passes WHERE status = 'done'`, { type: QueryTypes.SELECT }))[0]!.n);

async function expectOneDigestEach(emails: string[], jobsEach: number): Promise<void> {
  for (const [email, mails] of await inboxes(emails)) {
    expect(mails, email).toHaveLength(1);
    expect(mails[0]!.subject).toContain(`${jobsEach} jobs to plan`);
  }
}

describe('two worker processes started at once', { timeout: 120_000 }, () => {
  it('send each mail exactly once', async () => {
    const { emails } = await biggerOrchard(11);
    // Both start up (tsx, migrations), then begin their passes at the same instant.
    const startAt = new Date(Date.now() + 12_000).toISOString();
    const workers = [0, 1].map(() => spawnOnce(['--date', DAY, '--batch-size', '1', '--start-at', startAt]));
    const codes = await Promise.all(workers.map((w) => w.exited));
    expect(codes, workers.map((w) => w.output()).join('\n')).toEqual([0, 0]);
    const summaries = workers.map((w) => JSON.parse(w.output().trim().split('\n').at(-1)!) as { sites: number; sent: number });
    console.log('two workers:', summaries);
    expect(summaries[0]!.sites + summaries[1]!.sites).toBe(12);
    expect(summaries[0]!.sent + summaries[1]!.sent).toBe(3);
    expect(await sitePasses()).toBe(12);
    await expectOneDigestEach(emails, 24);
    expect(await OutboxMessage.count({ where: { status: 'sent' } })).toBe(3);
  });
});

describe('a worker killed with SIGKILL in the middle of a pass', { timeout: 120_000 }, () => {
  it('leaves the rest to the restarted worker, which sends everything once (killed after its first batch of sites)', async () => {
    const { emails } = await biggerOrchard(3);
    const first = spawnOnce(['--date', DAY, '--batch-size', '1', '--pause-at', 'batch:1']);
    await first.waitFor('PAUSED batch:1');
    first.child.kill('SIGKILL');
    await first.exited;
    // Two batches run at once, so the one beside the first may have finished too; no more.
    const doneBeforeKill = await sitePasses();
    expect(doneBeforeKill).toBeGreaterThanOrEqual(1);
    expect(doneBeforeKill).toBeLessThanOrEqual(2);
    for (const mails of (await inboxes(emails)).values()) expect(mails).toHaveLength(0);

    const second = spawnOnce(['--date', DAY, '--batch-size', '1']);
    expect(await second.exited, second.output()).toBe(0);
    expect(await sitePasses()).toBe(4);
    await expectOneDigestEach(emails, 8);
  });

  it('sends the rest and nothing twice when killed after its first send', async () => {
    const { emails } = await biggerOrchard(1, 4);
    const first = spawnOnce(['--date', DAY, '--pause-at', 'sent:1']);
    await first.waitFor('PAUSED sent:1');
    first.child.kill('SIGKILL');
    await first.exited;
    const before = [...(await inboxes(emails)).values()].reduce((n, m) => n + m.length, 0);
    expect(before).toBe(1);

    // The dead worker's claim on the other messages lasts two minutes; the restart comes after it.
    const later = new Date(Date.now() + 5 * 60_000).toISOString();
    const second = spawnOnce(['--date', DAY, '--now', later]);
    expect(await second.exited, second.output()).toBe(0);
    await expectOneDigestEach(emails, 4);
  });
});

describe('the mail server down, then back up', { timeout: 120_000 }, () => {
  it('keeps every message and delivers each exactly once', async () => {
    const { emails } = await orchard({ people: 3 });
    await dailyPass.run({ db: sequelize, links: { appUrl: APP_URL }, date: DAY });
    const down = createMailer(`smtp://127.0.0.1:${await freePort()}`, 'Spurwood <test@spurwood.example.org>');
    const up = createMailer(`smtp://127.0.0.1:${inject('smtpPort')}`, 'Spurwood <test@spurwood.example.org>');
    try {
      const start = Date.now();
      const failing = await deliverOutbox.run({ db: sequelize, mailer: down, now: () => new Date(start) });
      expect(failing).toMatchObject({ claimed: 3, sent: 0, failed: 3 });
      const waiting = await OutboxMessage.findAll();
      expect(waiting.map((m) => [m.status, m.attempts])).toEqual([['pending', 1], ['pending', 1], ['pending', 1]]);
      expect(waiting.every((m) => m.lastError)).toBe(true);
      // Still down at the first retry, 30 s later.
      expect(await deliverOutbox.run({ db: sequelize, mailer: down, now: () => new Date(start + 31_000) })).toMatchObject({ sent: 0, failed: 3 });
      // Too early for the second retry: nothing is tried, even with the server back.
      expect(await deliverOutbox.run({ db: sequelize, mailer: up, now: () => new Date(start + 40_000) })).toMatchObject({ claimed: 0 });
      expect(await deliverOutbox.run({ db: sequelize, mailer: up, now: () => new Date(start + 100_000) })).toMatchObject({ sent: 3, failed: 0 });
      expect(await deliverOutbox.run({ db: sequelize, mailer: up, now: () => new Date(start + 600_000) })).toMatchObject({ claimed: 0 });
    } finally {
      down.close();
      up.close();
    }
    for (const mails of (await inboxes(emails)).values()) expect(mails).toHaveLength(1);
    expect(await OutboxMessage.count({ where: { status: 'sent', attempts: 3 } })).toBe(3);
  });
});

describe('SIGTERM', { timeout: 120_000 }, () => {
  it('stops the long-running worker cleanly', async () => {
    const child = spawn(process.execPath, ['--import', 'tsx', 'worker/index.ts'], {
      cwd: repoRoot, env: { ...process.env, NODE_ENV: 'development', LOG_LEVEL: 'info', SMTP_URL: `smtp://127.0.0.1:${inject('smtpPort')}` }, stdio: ['ignore', 'pipe', 'pipe'],
    });
    let output = '';
    child.stdout.on('data', (chunk: Buffer) => (output += chunk.toString()));
    const exited = new Promise<number | null>((resolve) => child.once('exit', (code) => resolve(code)));
    const started = Date.now();
    while (!output.includes('worker started') && Date.now() - started < 30_000) await new Promise((r) => setTimeout(r, 50));
    expect(output).toContain('worker started');
    child.kill('SIGTERM');
    expect(await exited).toBe(0);
    expect(output).toContain('stopping worker');
  });
});
