// `npm run seed`: migrate, load the demo scenario when the database is empty, and give the demo sites their invented weather where they have none.
import { config } from '../server/config';
import { sequelize } from '../server/db';
import { migrate } from '../server/lib/migrator';
import * as dailyPass from '../worker/jobs/run-daily-pass';
import { seedDemo } from './demo';
import { demoLastDay, seedDemoWeather } from './demo-weather';

await migrate(sequelize);
const loaded = await seedDemo(sequelize);
console.log(loaded ? 'Demo scenario loaded.' : 'The database already has accounts; demo scenario not loaded.');
const weather = await seedDemoWeather(sequelize);
if (weather) console.log(`Invented weather loaded for ${weather} demo site${weather === 1 ? '' : 's'}.`);
if (loaded) {
  // A new demo looks as if the worker had already run yesterday: its care windows are stored (the
  // Jobs page and the calendar read them) and yesterday's digests wait in the outbox for the worker.
  const pass = await dailyPass.run({ db: sequelize, links: { appUrl: config.APP_URL }, date: demoLastDay() });
  console.log(`Yesterday's care pass: ${pass.windowsWritten} windows worked out, ${pass.digests} digests queued.`);
}
await sequelize.close();
