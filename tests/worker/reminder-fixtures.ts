// Shared set-up for the reminder worker's tests: a small orchard whose jobs on a fixed day are known,
// the daily pass run in-process or as real `worker/once.ts` processes, and mail read back per person.
import { spawn, type ChildProcess } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { inject } from 'vitest';
import { sequelize } from '../../server/db';
import { Group, Membership, Plant, Site, User } from '../../server/models';
import { repoRoot } from '../../scripts/lib/processes';
import * as dailyPass from '../../worker/jobs/run-daily-pass';
import { deliverQueuedMail, mailTo, type CaughtMail } from '../helpers/mail';

export const APP_URL = 'http://127.0.0.1:3999';
/** A Wednesday in late June: the fig's summer pruning closes on the 30th, the summer raspberries' picking opens on the 25th. */
export const DAY = '2026-06-24';

export interface Orchard { group: Group; site: Site; people: User[]; fig: Plant; raspberry: Plant; plum: Plant; emails: string[] }

/** Addresses unique to one test, because every worker and API test file shares one maildev. */
export const uniqueEmail = (who: string) => `${who}-${randomBytes(4).toString('hex')}@reminders.test.example.org`;

export async function orchard(options: { people?: number; siteName?: string; hazards?: Site['hazards'] } = {}): Promise<Orchard> {
  const group = await Group.create({ name: 'Brook Lane Orchard', kind: 'community-orchard' });
  const people: User[] = [];
  for (let i = 0; i < (options.people ?? 2); i += 1) {
    const user = await User.create({ email: uniqueEmail(`grower${i}`), name: `Grower ${i}`, passwordHash: 'x' });
    await Membership.create({ groupId: group.id, userId: user.id, role: i === 0 ? 'owner' : 'helper' });
    people.push(user);
  }
  const site = await Site.create({
    groupId: group.id, name: options.siteName ?? 'Lower field', latitude: 52.4, longitude: -1.9, elevationM: null, timeZone: 'Europe/London',
    hazards: options.hazards ?? ['overhead-lines'], notes: '', archivedAt: null,
  });
  const plant = (typeCode: Plant['typeCode'], form: Plant['form'], cultivar: string, heightM: number, positionLabel: string) => Plant.create({
    groupId: group.id, siteId: site.id, typeCode, cultivar, rootstock: '', form, plantedYear: 2015, heightM, positionLabel, healthFlags: [], notes: '', archivedAt: null,
  });
  const fig = await plant('fig', 'fan', 'Brown Turkey', 2.6, 'South wall');
  const raspberry = await plant('raspberry-summer', 'cane-row', 'Glen Ample', 1.8, 'Cane row');
  const plum = await plant('plum', 'bush', 'Victoria', 3.0, 'Middle of the field');
  return { group, site, people, fig, raspberry, plum, emails: people.map((p) => p.email) };
}

/** One pass in this process, then the outbox delivered to the test maildev until nothing is due. */
export async function passAndDeliver(date = DAY) {
  const pass = await dailyPass.run({ db: sequelize, links: { appUrl: APP_URL }, date });
  let round;
  do round = await deliverQueuedMail();
  while (round.claimed > 0);
  return pass;
}

export async function inboxes(emails: string[]): Promise<Map<string, CaughtMail[]>> {
  return new Map(await Promise.all(emails.map(async (e) => [e, await mailTo(e)] as const)));
}

export interface OnceProcess { child: ChildProcess; output: () => string; exited: Promise<number | null>; waitFor(text: string, ms?: number): Promise<void> }

/** A real `node --import tsx worker/once.ts` process against this file's database and the test maildev. */
export function spawnOnce(args: string[], smtpPort = inject('smtpPort')): OnceProcess {
  const child = spawn(process.execPath, ['--import', 'tsx', 'worker/once.ts', ...args], {
    cwd: repoRoot,
    env: { ...process.env, SMTP_URL: `smtp://127.0.0.1:${smtpPort}`, APP_URL, NODE_ENV: 'test' },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let output = '';
  child.stdout!.on('data', (chunk: Buffer) => (output += chunk.toString()));
  child.stderr!.on('data', (chunk: Buffer) => (output += chunk.toString()));
  const exited = new Promise<number | null>((resolve) => child.once('exit', (code) => resolve(code)));
  return {
    child,
    output: () => output,
    exited,
    waitFor: (text, ms = 30_000) => new Promise<void>((resolve, reject) => {
      const started = Date.now();
      const timer = setInterval(() => {
        if (output.includes(text)) { clearInterval(timer); resolve(); }
        else if (Date.now() - started > ms || child.exitCode !== null) { clearInterval(timer); reject(new Error(`"${text}" never came; output:\n${output}`)); }
      }, 50);
    }),
  };
}
