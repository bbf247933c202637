// End-to-end set-up: the whole product as `npm start` runs it — a throw-away PostgreSQL with the
// demo scenario, maildev, the built client served by the real web server, and the worker — on free
// loopback ports. Everything is stopped and removed afterwards.
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import type { TestProject } from 'vitest/node';
import pg from 'pg';
import { buildClientIfStale } from '../../scripts/lib/client-build';
import { freePort } from '../../scripts/lib/free-port';
import { repoRoot, waitForHealth } from '../../scripts/lib/processes';
import { startMaildev, startTestCluster } from './test-services';

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
    maildevWebPort: number;
    /** For the few journeys that must set up what the date cannot give (an open feed window in December). */
    e2eDatabaseUrl: string;
  }
}

function stopProcess(child: ChildProcess): Promise<void> {
  return new Promise((resolve) => {
    if (child.exitCode !== null || child.signalCode !== null) return resolve();
    child.once('exit', () => resolve());
    child.kill('SIGTERM');
    setTimeout(() => child.kill('SIGKILL'), 5_000).unref();
  });
}

export default async function setup(project: TestProject) {
  const started = Date.now();
  buildClientIfStale((line) => console.log(`[e2e] ${line}`));
  const test = await startTestCluster();
  const admin = new pg.Client({ connectionString: test.cluster.url('postgres') });
  await admin.connect();
  await admin.query('CREATE DATABASE spurwood_e2e');
  await admin.end();
  const mail = await startMaildev();
  const port = await freePort();
  const baseUrl = `http://127.0.0.1:${port}`;
  const env = {
    ...process.env,
    NODE_ENV: 'production' as const,
    DATABASE_URL: test.cluster.url('spurwood_e2e'),
    SMTP_URL: `smtp://127.0.0.1:${mail.smtpPort}`,
    PORT: String(port),
    APP_URL: baseUrl,
    SESSION_SECRET: 'end-to-end-tests-session-secret',
    BCRYPT_COST: '4',
    LOG_LEVEL: 'warn',
    UPLOAD_DIR: path.join(test.root, 'uploads'),
  };
  const seeded = spawnSync(process.execPath, ['--import', 'tsx', 'seeds/run.ts'], { cwd: repoRoot, env, encoding: 'utf8' });
  if (seeded.status !== 0) throw new Error(`Seeding failed:\n${seeded.stderr}`);
  const children = ['server/index.ts', 'worker/index.ts'].map((entry) => spawn(process.execPath, ['--import', 'tsx', entry], { cwd: repoRoot, env, stdio: ['ignore', 'inherit', 'inherit'] }));
  await waitForHealth(`${baseUrl}/api/health`, 60_000);
  project.provide('baseUrl', baseUrl);
  project.provide('maildevWebPort', mail.webPort);
  project.provide('e2eDatabaseUrl', env.DATABASE_URL);
  console.log(`[e2e] Spurwood up at ${baseUrl} in ${Date.now() - started} ms`);
  return async () => {
    await Promise.all(children.map(stopProcess));
    await mail.stop();
    test.remove();
  };
}
