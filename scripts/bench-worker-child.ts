// One measured step of the worker benchmark, in a process of its own so its peak memory is its own:
// `floor` reads the plant and reading rows the pass reads, with nothing else; `pass` runs the
// daily pass for every site as if on --date (windows, reminders, digests queued; nothing sent).
// Prints one JSON line. DATABASE_URL comes from the parent (scripts/bench-worker.ts).
import { performance } from 'node:perf_hooks';
import { QueryTypes } from 'sequelize';
import { sequelize } from '../server/db';
import * as dailyPass from '../worker/jobs/run-daily-pass';

const [mode, date] = process.argv.slice(2) as ['floor' | 'pass', string];
const baselineMb = process.memoryUsage().rss / 2 ** 20;
let peakMb = baselineMb;
const sampler = setInterval(() => (peakMb = Math.max(peakMb, process.memoryUsage().rss / 2 ** 20)), 20);

await sequelize.query('SELECT 1');
const started = performance.now();
const cpuStart = process.cpuUsage();
let result: object;
const timings: Record<string, number> = {};
if (mode === 'floor') {
  const plants = await sequelize.query(
    'SELECT id, group_id, site_id, type_code, form, planted_year, health_flags FROM plants WHERE archived_at IS NULL ORDER BY site_id, id',
    { type: QueryTypes.SELECT },
  );
  const readings = await sequelize.query(
    `SELECT site_id, to_char(date, 'YYYY-MM-DD') AS date, tmin_c, tmax_c FROM site_readings WHERE date <= $1::date ORDER BY site_id, date`,
    { bind: [date], type: QueryTypes.SELECT },
  );
  result = { plants: plants.length, readings: readings.length };
} else {
  result = await dailyPass.run({ db: sequelize, links: { appUrl: 'http://127.0.0.1:3000' }, date, batchSize: 250, timings });
}
const wallMs = Math.round(performance.now() - started);
const cpu = process.cpuUsage(cpuStart);
clearInterval(sampler);
peakMb = Math.max(peakMb, process.memoryUsage().rss / 2 ** 20);
console.log(JSON.stringify({ mode, date, wallMs, cpuS: (cpu.user + cpu.system) / 1e6, peakRssMb: Math.round(peakMb), maxRssMb: Math.round(process.resourceUsage().maxRSS / 1024), baselineRssMb: Math.round(baselineMb), ...result, steps: Object.fromEntries(Object.entries(timings).map(([k, v]) => [k, Math.round(v)])) }));
await sequelize.close();
