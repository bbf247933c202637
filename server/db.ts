import { Sequelize } from 'sequelize';
import { config } from './config';
import { initModels } from './models';

// One connection pool per process; models are bound to it at import time so services can use them directly.
export const sequelize = new Sequelize(config.DATABASE_URL, {
  dialect: 'postgres',
  logging: false,
  define: { underscored: true },
  pool: { max: 10, min: 0, idle: 10_000 },
});

initModels(sequelize);

export async function isDatabaseUp(): Promise<boolean> {
  try {
    await sequelize.query('SELECT 1');
    return true;
  } catch {
    return false;
  }
}
