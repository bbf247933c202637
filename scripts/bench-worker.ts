// `npm run bench:worker`: one daily pass over an invented world of 10,000 people, 5,000 sites and
// 100,000 plants with a season of daily readings at every site, in a throw-away PostgreSQL cluster
// (fsync off, as in the tests; 1 GB of shared buffers). Prints figures and asserts nothing.
//
// Figures: the floor (a bare SELECT of the plant and reading rows the pass reads), the first pass
// (Sunday: every window is written from nothing), Monday's (windows unchanged, a weekly list for
// everyone) and Tuesday's (windows unchanged, only the day's new reminders: most days are like it).
// Each step runs in a fresh process so its peak memory is its own.
// Optional: PEOPLE=… SITES=… PLANTS=… in the environment.
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import pg from 'pg';
import { Sequelize } from 'sequelize';
import { makeWorld } from './lib/bench-worker-data';
import { freePort } from './lib/free-port';
import { ensurePostgres, initCluster, makeOpenFolder, startCluster } from './lib/postgres';
import { repoRoot } from './lib/processes';
import { migrate } from '../server/lib/migrator';

const size = { people: Number(process.env.PEOPLE ?? 10_000), sites: Number(process.env.SITES ?? 5_000), plants: Number(process.env.PLANTS ?? 100_000) };
// The first pass on a Sunday, so the Monday after it is a steady day with everyone's weekly list.
const FIRST_DAY = '2026-06-21';
const MONDAY = '2026-06-22';
const TUESDAY = '2026-06-23';

const root = makeOpenFolder(fs.mkdtempSync(path.join(os.tmpdir(), 'spurwood-bench-')));
const bin = ensurePostgres();
// A server holding 100,000 plants would give PostgreSQL more than its default 128 MB of cache; a
// gigabyte holds the world's tables and indexes, as on such a server.
const options = { dataDir: path.join(root, 'data'), port: await freePort(), user: 'spurwood', durable: false, sharedBuffers: '1GB' };
initCluster(bin, options);
const cluster = startCluster(bin, options);

// On a shared machine wall time swings with everyone else's load, so each step also reports the CPU
// time it cost: its own process, plus the PostgreSQL cluster's (the postmaster's reaped children and
// the backends still alive, from /proc; Linux only, else reported as 0).
const TICKS_PER_SECOND = 100;
function clusterCpuSeconds(): number {
  try {
    const pid = fs.readFileSync(path.join(options.dataDir, 'postmaster.pid'), 'utf8').split('\n')[0]!.trim();
    const fields = (p: string) => fs.readFileSync(`/proc/${p}/stat`, 'utf8').replace(/^.*\) /, '').split(' ').map(Number);
    const own = fields(pid);
    let ticks = own[11]! + own[12]! + own[13]! + own[14]!;
    for (const entry of fs.readdirSync('/proc').filter((e) => /^\d+$/.test(e))) {
      try {
        const f = fields(entry);
        if (String(f[1]) === pid) ticks += f[11]! + f[12]!;
      } catch {
        // The process ended between the listing and the read; its time is now the postmaster's.
      }
    }
    return ticks / TICKS_PER_SECOND;
  } catch {
    return 0;
  }
}

function step(mode: 'floor' | 'pass', date: string): Record<string, unknown> {
  const dbBefore = clusterCpuSeconds();
  const result = runStep(mode, date);
  return { ...result, dbCpuS: clusterCpuSeconds() - dbBefore };
}

function runStep(mode: 'floor' | 'pass', date: string): Record<string, unknown> {
  const run = spawnSync(process.execPath, [...(process.env.CPU_PROF && mode === 'pass' ? ['--cpu-prof', '--cpu-prof-dir=/tmp/prof'] : []), '--import', 'tsx', 'scripts/bench-worker-child.ts', mode, date], {
    cwd: repoRoot, encoding: 'utf8', env: { ...process.env, DATABASE_URL: cluster.url('bench'), NODE_ENV: 'test' }, maxBuffer: 2 ** 24,
  });
  if (run.status !== 0) throw new Error(`${mode} failed:\n${run.stderr}`);
  return JSON.parse(run.stdout.trim().split('\n').at(-1)!) as Record<string, unknown>;
}

try {
  const admin = new pg.Client({ connectionString: cluster.url('postgres') });
  await admin.connect();
  await admin.query('CREATE DATABASE bench');
  await admin.end();
  const schema = new Sequelize(cluster.url('bench'), { logging: false, define: { underscored: true } });
  await migrate(schema);
  await schema.close();
  const db = new pg.Client({ connectionString: cluster.url('bench') });
  await db.connect();
  const madeAt = Date.now();
  const { readings } = await makeWorld(db, { ...size, readingsThrough: '2026-06-20' });
  await db.end();
  console.log(`World: ${size.people} people, ${size.sites} sites, ${size.plants} plants, ${readings} daily readings (made in ${((Date.now() - madeAt) / 1000).toFixed(1)} s)`);

  const floor = [step('floor', FIRST_DAY), step('floor', FIRST_DAY)].sort((a, b) => Number(a.wallMs) - Number(b.wallMs))[0]!;
  const cpu = (r: Record<string, unknown>) => Number(r.cpuS) + Number(r.dbCpuS);
  const first = step('pass', FIRST_DAY);
  const monday = step('pass', MONDAY);
  const tuesday = step('pass', TUESDAY);
  const stats = new pg.Client({ connectionString: cluster.url('bench') });
  await stats.connect();
  const { rows: [mail] } = await stats.query(`SELECT round(avg(length(payload::text))) AS bytes, count(*) AS n FROM outbox_messages`);
  const { rows: [windows] } = await stats.query(`SELECT count(*) AS n, pg_size_pretty(pg_total_relation_size('care_windows')) AS size FROM care_windows`);
  await stats.end();
  const seconds = (ms: unknown) => `${(Number(ms) / 1000).toFixed(2)} s`;
  const ratio = (ms: unknown) => `${(Number(ms) / Number(floor.wallMs)).toFixed(1)}× the floor`;
  console.log(`Floor, bare SELECT of ${floor.plants} plants and ${floor.readings} readings: ${seconds(floor.wallMs)}, CPU ${cpu(floor).toFixed(2)} s, peak RSS ${floor.peakRssMb} MB`);
  for (const [label, r] of [[`First pass (${FIRST_DAY}, every window new)`, first], [`Monday's pass (${MONDAY}, a weekly list for everyone)`, monday], [`Tuesday's pass (${TUESDAY})`, tuesday]] as const) {
    console.log(`${label}: ${seconds(r.wallMs)} (${ratio(r.wallMs)}); CPU ${cpu(r).toFixed(2)} s (${(cpu(r) / cpu(floor)).toFixed(1)}× the floor's; worker ${Number(r.cpuS).toFixed(2)} s, PostgreSQL ${Number(r.dbCpuS).toFixed(2)} s); peak RSS ${r.peakRssMb} MB (max RSS ${r.maxRssMb} MB, ${r.baselineRssMb} MB after start-up); ` +
      `${r.sites} sites, ${r.windowsWritten} windows written, ${r.reminders} reminders, ${r.digests} mails queued`);
    console.log(`  steps (s): ${Object.entries(r.steps as Record<string, number>).map(([k, v]) => `${k} ${(v / 1000).toFixed(2)}`).join(', ')}`);
  }
  console.log(`Stored: ${windows.n} care windows (${windows.size} with indexes); ${mail.n} digests queued, ${mail.bytes} bytes of payload each on average`);
} finally {
  cluster.stop();
  fs.rmSync(root, { recursive: true, force: true });
}
