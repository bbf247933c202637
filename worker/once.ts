// `npm run worker:once -- --date YYYY-MM-DD`: one pass for every site as if on that day, then one
// delivery of the outbox, then exit. For operators and tests. Without --date, only the sites that
// are due now (local time past 06:00, no pass yet today) run, as the hourly tick would run them.
//
// Test-only flags: --batch-size N (sites per transaction), --now ISO (the clock for due sites and
// for delivery), --pause-at batch:N | sent:N (print "PAUSED …" and hang there, so a test can kill
// the process at a known point of the pass), --start-at ISO (wait until then after start-up, so two
// processes begin their passes at the same moment).
import { parseArgs } from 'node:util';
import { config } from '../server/config';
import { sequelize } from '../server/db';
import { migrate } from '../server/lib/migrator';
import { isoDateSchema } from '../server/schemas/common';
import * as deliverOutbox from './jobs/deliver-outbox';
import * as dailyPass from './jobs/run-daily-pass';
import { createMailer } from './mailer';

const { values } = parseArgs({
  options: { date: { type: 'string' }, 'batch-size': { type: 'string' }, now: { type: 'string' }, 'pause-at': { type: 'string' }, 'start-at': { type: 'string' } },
});

function fail(message: string): never {
  console.error(message);
  process.exit(2);
}

const date = values.date === undefined ? undefined : isoDateSchema.safeParse(values.date).success ? values.date : fail('--date must be a real day as YYYY-MM-DD');
const batchSize = values['batch-size'] === undefined ? undefined : Number(values['batch-size']);
if (batchSize !== undefined && !(Number.isInteger(batchSize) && batchSize > 0)) fail('--batch-size must be a whole number above 0');
const fixedNow = values.now === undefined ? null : new Date(values.now);
if (fixedNow && Number.isNaN(fixedNow.getTime())) fail('--now must be an ISO 8601 instant');
const now = () => fixedNow ?? new Date();
const pauseMatch = values['pause-at'] === undefined ? null : /^(batch|sent):(\d+)$/.exec(values['pause-at']) ?? fail('--pause-at takes batch:N or sent:N');

async function pauseIf(point: 'batch' | 'sent', count: number): Promise<void> {
  if (!pauseMatch || pauseMatch[1] !== point || Number(pauseMatch[2]) !== count) return;
  console.log(`PAUSED ${point}:${count}`);
  await new Promise<never>(() => setInterval(() => {}, 60_000));
}

await migrate(sequelize);
const startAt = values['start-at'] === undefined ? 0 : Date.parse(values['start-at']);
if (Number.isNaN(startAt)) fail('--start-at must be an ISO 8601 instant');
await new Promise((resolve) => setTimeout(resolve, Math.max(0, startAt - Date.now())));
const mailer = createMailer(config.SMTP_URL, config.MAIL_FROM);
const pass = await dailyPass.run({
  db: sequelize, links: { appUrl: config.APP_URL }, now, ...(date ? { date } : {}), ...(batchSize ? { batchSize } : {}),
  afterBatch: (n) => pauseIf('batch', n),
  log: (msg, extra) => console.warn(msg, extra ?? ''),
});
let sent = 0;
let failed = 0;
for (;;) {
  const round = await deliverOutbox.run({ db: sequelize, mailer, now, afterSent: (n) => pauseIf('sent', sent + n) });
  sent += round.sent;
  failed += round.failed;
  if (round.claimed === 0) break;
}
console.log(JSON.stringify({ ...pass, sent, failedSends: failed }));
mailer.close();
await sequelize.close();
