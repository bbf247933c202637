import cron from 'node-cron';
import { config } from '../server/config';
import { sequelize } from '../server/db';
import { logger } from '../server/lib/logger';
import { migrate } from '../server/lib/migrator';
import * as deliverOutbox from './jobs/deliver-outbox';
import * as dailyPass from './jobs/run-daily-pass';
import * as storeExpiry from './jobs/notify-store-expiry';
import * as stationReadings from './jobs/pull-station-readings';
import { createMailer } from './mailer';

const log = logger.child({ process: 'worker' });

async function main(): Promise<void> {
  await migrate(sequelize);
  const mailer = createMailer(config.SMTP_URL, config.MAIL_FROM);
  const stopping = new AbortController();
  // Jobs in flight, so a stop can wait for them to finish instead of cutting a send or a batch short.
  const running = new Set<Promise<unknown>>();
  const track = <T>(job: () => Promise<T>) => async () => {
    if (stopping.signal.aborted) return;
    const promise = job();
    running.add(promise);
    try {
      await promise;
    } finally {
      running.delete(promise);
    }
  };

  // Password-reset and invitation mails should arrive within seconds, so the outbox is polled often;
  // SKIP LOCKED claims make it safe for several workers to poll at once.
  const outboxTask = cron.schedule(
    '*/5 * * * * *',
    track(async () => {
      const result = await deliverOutbox.run({ db: sequelize, mailer, log: (msg, extra) => log.warn(extra, msg) });
      if (result.claimed) log.info(result, 'outbox delivered');
    }),
    { name: 'deliver-outbox', noOverlap: true, timezone: 'UTC' },
  );
  // Every hour, each site whose local time is past 06:00 and whose day has not run yet gets its pass.
  // Time zones differ by whole or half hours, so an hourly tick starts each site within an hour of 06:00.
  const runPass = track(async () => {
    const result = await dailyPass.run({ db: sequelize, links: { appUrl: config.APP_URL }, signal: stopping.signal, log: (msg, extra) => log.warn(extra, msg) });
    if (result.sites || result.digests) log.info(result, 'daily pass');
  });
  const passTask = cron.schedule('0 * * * *', runPass, { name: 'daily-pass', noOverlap: true, timezone: 'UTC' });
  // A worker started at 09:20 should not wait until 10:00 to catch up on the morning's passes.
  const firstPass = setTimeout(() => void runPass().catch((err: unknown) => log.error({ err }, 'daily pass failed')), 2_000);

  // Use-by notices for stored produce; hourly so a worker that was down at any hour still catches up.
  const storeTask = cron.schedule(
    '5 * * * *',
    track(async () => {
      const result = await storeExpiry.run({ db: sequelize });
      if (result.queued) log.info(result, 'store use-by notices queued');
    }),
    { name: 'notify-store-expiry', noOverlap: true, timezone: 'UTC' },
  );

  // Station-linked sites get yesterday's readings before the next hour's passes read them; the pull
  // asks only for missing days, so running it hourly costs little and catches up after an outage.
  const stationTask = cron.schedule(
    '50 * * * *',
    track(async () => {
      const result = await stationReadings.run({ db: sequelize, log: (msg, extra) => log.warn(extra, msg) });
      if (result.added || result.failed) log.info(result, 'station readings pulled');
    }),
    { name: 'pull-station-readings', noOverlap: true, timezone: 'UTC' },
  );

  log.info({ schedules: { 'deliver-outbox': 'every 5 seconds', 'daily-pass': 'at minute 0 of every hour (UTC), and at start-up', 'notify-store-expiry': 'at minute 5 of every hour (UTC)', 'pull-station-readings': 'at minute 50 of every hour (UTC)' }, smtp: config.SMTP_URL.replace(/\/\/[^@]*@/, '//…@') }, 'worker started');

  const stop = async (signal: string) => {
    log.info({ signal, running: running.size }, 'stopping worker: letting running jobs finish');
    stopping.abort();
    clearTimeout(firstPass);
    await Promise.all([outboxTask.stop(), passTask.stop(), storeTask.stop(), stationTask.stop()]);
    await Promise.allSettled([...running]);
    mailer.close();
    await sequelize.close();
    process.exit(0);
  };
  process.once('SIGINT', () => void stop('SIGINT'));
  process.once('SIGTERM', () => void stop('SIGTERM'));
}

main().catch((err: unknown) => {
  log.fatal({ err }, 'worker failed to start');
  process.exit(1);
});
