// `npm run seed`: migrate, load the demo scenario when the database is empty, and give the demo sites their invented weather where they have none.
import { sequelize } from '../server/db';
import { migrate } from '../server/lib/migrator';
import { seedDemo } from './demo';
import { seedDemoWeather } from './demo-weather';

await migrate(sequelize);
const loaded = await seedDemo(sequelize);
console.log(loaded ? 'Demo scenario loaded.' : 'The database already has accounts; demo scenario not loaded.');
const weather = await seedDemoWeather(sequelize);
if (weather) console.log(`Invented weather loaded for ${weather} demo site${weather === 1 ? '' : 's'}.`);
await sequelize.close();
