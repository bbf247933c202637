// `npm run migrate`: apply every pending migration to DATABASE_URL.
import { sequelize } from '../server/db';
import { migrate } from '../server/lib/migrator';

const applied = await migrate(sequelize);
console.log(applied.length ? `Applied: ${applied.join(', ')}` : 'The schema is up to date.');
await sequelize.close();
