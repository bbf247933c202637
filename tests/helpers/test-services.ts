// Real services for the tests: a throw-away PostgreSQL cluster on a free loopback port and maildev.
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { Sequelize } from 'sequelize';
import { freePort } from '../../scripts/lib/free-port';
import { spawnMaildev, type RunningMaildev } from '../../scripts/lib/maildev';
import { ensurePostgres, initCluster, makeOpenFolder, startCluster, type Cluster } from '../../scripts/lib/postgres';
import { migrate } from '../../server/lib/migrator';

export const TEMPLATE_DATABASE = 'spurwood_template';

export interface TestCluster { cluster: Cluster; root: string; remove(): void }

export async function startTestCluster(): Promise<TestCluster> {
  const bin = ensurePostgres((line) => console.log(line));
  // mkdtemp makes a 0700 folder; the server user (as root: postgres) must be able to enter it.
  const root = makeOpenFolder(fs.mkdtempSync(path.join(os.tmpdir(), 'spurwood-test-')));
  const options = { dataDir: path.join(root, 'data'), port: await freePort(), user: 'spurwood', durable: false };
  initCluster(bin, options);
  const cluster = startCluster(bin, options);
  return {
    cluster,
    root,
    remove: () => {
      try {
        cluster.stop();
      } finally {
        fs.rmSync(root, { recursive: true, force: true });
      }
    },
  };
}

/** Creates the template database every test file clones, with every migration applied. */
export async function createMigratedTemplate(cluster: Cluster): Promise<void> {
  const admin = new Sequelize(cluster.url('postgres'), { logging: false });
  await admin.query(`CREATE DATABASE ${TEMPLATE_DATABASE}`);
  await admin.close();
  const template = new Sequelize(cluster.url(TEMPLATE_DATABASE), { logging: false, define: { underscored: true } });
  await migrate(template);
  await template.close();
}

export async function startMaildev(): Promise<RunningMaildev> {
  return spawnMaildev(await freePort(), await freePort());
}
