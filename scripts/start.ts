// `npm start` (and `npm run dev`): brings up the whole product on loopback — PostgreSQL from
// Debian's packages in .data/, maildev, the web server and the worker — and stops all of it on
// Ctrl-C. DATABASE_URL, SMTP_URL and STATION_URL point at services of your own instead; PORT moves the web server.
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import pg from 'pg';
import { buildClientIfStale } from './lib/client-build';
import { isPortInUse } from './lib/free-port';
import { maildevArgs } from './lib/maildev';
import { ensurePostgres, initCluster, isInitialised, serverUserCanEnter, startCluster, stopCluster, type Cluster } from './lib/postgres';
import { repoRoot, waitForHealth } from './lib/processes';

const isDev = process.argv.includes('--dev');
const dataDir = path.join(repoRoot, '.data');
const port = Number(process.env.PORT ?? 3000);
const stationFakePort = 8089;
const started: { name: string; child: ChildProcess }[] = [];
let cluster: Cluster | null = null;
let stopping = false;

const say = (line: string) => console.log(`[start] ${line}`);

function secretFile(name: string): string {
  const file = path.join(dataDir, name);
  if (!fs.existsSync(file)) fs.writeFileSync(file, randomBytes(24).toString('base64url'), { mode: 0o600 });
  return fs.readFileSync(file, 'utf8').trim();
}

async function startDatabase(): Promise<string> {
  if (process.env.DATABASE_URL) {
    say('Using the PostgreSQL server in DATABASE_URL');
    return process.env.DATABASE_URL;
  }
  const bin = ensurePostgres(say);
  const options = { dataDir: path.join(dataDir, 'postgres'), port: 54329, user: 'spurwood', password: secretFile('postgres-password'), durable: true };
  if (!serverUserCanEnter(dataDir)) {
    throw new Error(`The postgres system user cannot enter ${dataDir}; make the folders above it enterable (chmod o+x) or set DATABASE_URL.`);
  }
  if (!isInitialised(options.dataDir)) {
    say('Creating the database cluster in .data/postgres (first start only)…');
    initCluster(bin, options);
  } else {
    // A start that was killed may have left the server running; stop it cleanly before reusing the data.
    stopCluster(bin, options.dataDir);
  }
  if (await isPortInUse(options.port)) throw new Error(`Port ${options.port} is taken by another program; stop it or set DATABASE_URL.`);
  cluster = startCluster(bin, options);
  const admin = new pg.Client({ connectionString: cluster.url('postgres') });
  await admin.connect();
  const exists = await admin.query('SELECT 1 FROM pg_database WHERE datname = $1', ['spurwood']);
  if (!exists.rowCount) await admin.query('CREATE DATABASE spurwood');
  await admin.end();
  say(`PostgreSQL is up on 127.0.0.1:${options.port} (data in .data/postgres)`);
  return cluster.url('spurwood');
}

function launch(name: string, command: string, args: string[], env: NodeJS.ProcessEnv): ChildProcess {
  const child = spawn(command, args, { cwd: repoRoot, env, stdio: ['ignore', 'inherit', 'inherit'] });
  started.push({ name, child });
  child.on('exit', (code, signal) => {
    if (stopping) return;
    console.error(`[start] ${name} stopped unexpectedly (${signal ?? `exit ${code}`}); stopping everything.`);
    void shutdown(1);
  });
  return child;
}

async function shutdown(code: number): Promise<never> {
  if (stopping) return new Promise(() => {}) as Promise<never>;
  stopping = true;
  say('Stopping…');
  await Promise.all(
    started.map(
      ({ child }) =>
        new Promise<void>((resolve) => {
          if (child.exitCode !== null || child.signalCode !== null) return resolve();
          child.once('exit', () => resolve());
          child.kill('SIGTERM');
          setTimeout(() => child.kill('SIGKILL'), 8_000).unref();
        }),
    ),
  );
  if (cluster) {
    cluster.stop();
    say('PostgreSQL stopped');
  }
  process.exit(code);
}

async function main(): Promise<void> {
  fs.mkdirSync(dataDir, { recursive: true });
  process.on('SIGINT', () => void shutdown(0));
  process.on('SIGTERM', () => void shutdown(0));

  const databaseUrl = await startDatabase();
  const env: NodeJS.ProcessEnv = {
    ...process.env,
    DATABASE_URL: databaseUrl,
    PORT: String(port),
    NODE_ENV: isDev ? 'development' : 'production',
    SESSION_SECRET: process.env.SESSION_SECRET ?? secretFile('session-secret'),
  };

  if (!process.env.SMTP_URL) {
    launch('maildev', process.execPath, maildevArgs(1025, 1080), env);
    env.SMTP_URL = 'smtp://127.0.0.1:1025';
  }

  // The weather-station fake stands in for a real station service unless STATION_URL names one.
  if (!process.env.STATION_URL) {
    if (await isPortInUse(stationFakePort)) say(`Port ${stationFakePort} is taken; assuming a station service is already listening there`);
    else launch('station fake', process.execPath, ['--import', 'tsx', 'scripts/station-fake.ts'], { ...env, STATION_FAKE_PORT: String(stationFakePort) });
    env.STATION_URL = `http://127.0.0.1:${stationFakePort}`;
  }

  const seed = spawnSync(process.execPath, ['--import', 'tsx', 'seeds/run.ts'], { cwd: repoRoot, env, stdio: 'inherit' });
  if (seed.status !== 0) throw new Error('Migrations or the demo scenario failed to load (see above)');

  if (isDev) {
    launch('web server', process.execPath, ['--import', 'tsx', '--watch', 'server/index.ts'], env);
    launch('vite', process.execPath, ['node_modules/vite/bin/vite.js', '--host', '127.0.0.1', '--port', '5173', '--strictPort'], env);
  } else {
    buildClientIfStale(say);
    launch('web server', process.execPath, ['--import', 'tsx', 'server/index.ts'], env);
  }
  launch('worker', process.execPath, ['--import', 'tsx', 'worker/index.ts'], env);
  await waitForHealth(`http://127.0.0.1:${port}/api/health`, 60_000);

  const appUrl = isDev ? 'http://127.0.0.1:5173' : `http://127.0.0.1:${port}`;
  console.log(`
  Spurwood is running.
    App:    ${appUrl}
    Inbox:  ${process.env.SMTP_URL ? '(your SMTP server)' : 'http://127.0.0.1:1080'}
    Sign in as owner@example.org, grower@example.org, helper@example.org or viewer@example.org
    with the password orchard-demo.
  Press Ctrl-C to stop everything.
`);
}

main().catch(async (err: unknown) => {
  console.error(`[start] ${err instanceof Error ? err.message : String(err)}`);
  await shutdown(1);
});
