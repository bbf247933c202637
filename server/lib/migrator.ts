import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import type { Sequelize } from 'sequelize';
import { SequelizeStorage, Umzug, type MigrationFn } from 'umzug';

export type Migration = MigrationFn<Sequelize>;

const migrationsDir = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../migrations');

export function createMigrator(sequelize: Sequelize, logger: Umzug<Sequelize>['options']['logger'] = undefined) {
  return new Umzug<Sequelize>({
    migrations: {
      glob: ['*-*.ts', { cwd: migrationsDir }],
      resolve: ({ name, path: file, context }) => ({
        name,
        up: async () => (await import(pathToFileURL(file!).href)).up({ name, path: file, context }),
        down: async () => (await import(pathToFileURL(file!).href)).down({ name, path: file, context }),
      }),
    },
    context: sequelize,
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger,
  });
}

// Any number of servers may start at once; an advisory lock lets one migrate while the others wait.
const MIGRATION_LOCK = 5_127_001;

/** Applies every pending migration; a no-op when the schema is current. */
export async function migrate(sequelize: Sequelize): Promise<string[]> {
  return sequelize.transaction(async (transaction) => {
    await sequelize.query('SELECT pg_advisory_xact_lock(:lock)', { replacements: { lock: MIGRATION_LOCK }, transaction });
    const applied = await createMigrator(sequelize).up();
    return applied.map((m) => m.name);
  });
}
