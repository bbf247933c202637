import cron from 'node-cron';
import { config } from '../server/config';
import { sequelize } from '../server/db';
import { logger } from '../server/lib/logger';
import { migrate } from '../server/lib/migrator';
import * as deliverOutbox from './jobs/deliver-outbox';
import { createMailer } from './mailer';

const log = logger.child({ process: 'worker' });

async function main(): Promise<void> {
  await migrate(sequelize);
  const mailer = createMailer(config.SMTP_URL, config.MAIL_FROM);

  // Password-reset and invitation mails should arrive within seconds, so the outbox is polled often;
  // SKIP LOCKED claims make it safe for several workers to poll at once.
  const outboxTask = cron.schedule(
    '*/5 * * * * *',
    async () => {
      const result = await deliverOutbox.run({ db: sequelize, mailer, log: (msg, extra) => log.warn(extra, msg) });
      if (result.claimed) log.info(result, 'outbox delivered');
    },
    { name: 'deliver-outbox', noOverlap: true, timezone: 'UTC' },
  );
  // The hourly care pass (window refresh and reminders) is scheduled here once it is built.
  const hourlyTask = cron.schedule('0 * * * *', () => log.info('hourly tick: no reminder jobs are scheduled yet'), { name: 'hourly-tick', noOverlap: true, timezone: 'UTC' });

  log.info({ schedules: { 'deliver-outbox': 'every 5 seconds', 'hourly-tick': 'at minute 0 of every hour (UTC)' }, smtp: config.SMTP_URL.replace(/\/\/[^@]*@/, '//…@') }, 'worker started');

  const stop = async (signal: string) => {
    log.info({ signal }, 'stopping worker');
    await Promise.all([outboxTask.stop(), hourlyTask.stop()]);
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
