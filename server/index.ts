import type { Server } from 'node:http';
import { createApp } from './app';
import { config } from './config';
import { sequelize } from './db';
import { logger } from './lib/logger';
import { migrate } from './lib/migrator';

async function main(): Promise<void> {
  const applied = await migrate(sequelize);
  if (applied.length) logger.info({ applied }, 'migrations applied');

  const app = createApp();
  const server: Server = app.listen(config.PORT, config.HOST, () => {
    logger.info(`Spurwood web server listening on http://${config.HOST}:${config.PORT}`);
  });

  let stopping = false;
  const stop = (signal: string) => {
    if (stopping) return;
    stopping = true;
    logger.info({ signal }, 'stopping web server');
    server.close(() => {
      sequelize.close().finally(() => process.exit(0));
    });
    // Keep-alive connections would hold close() open; give them a moment, then end them.
    setTimeout(() => server.closeAllConnections(), 5_000).unref();
  };
  process.on('SIGINT', () => stop('SIGINT'));
  process.on('SIGTERM', () => stop('SIGTERM'));
}

main().catch((err: unknown) => {
  logger.fatal({ err }, 'web server failed to start');
  process.exit(1);
});
