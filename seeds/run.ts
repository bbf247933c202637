// `npm run seed`: migrate, then load the demo scenario when the database is empty.
import { sequelize } from '../server/db';
import { migrate } from '../server/lib/migrator';
import { seedDemo } from './demo';

await migrate(sequelize);
const loaded = await seedDemo(sequelize);
console.log(loaded ? 'Demo scenario loaded.' : 'The database already has accounts; demo scenario not loaded.');
await sequelize.close();
