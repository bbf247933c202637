import os from 'node:os';
import { QueryTypes, type Sequelize } from 'sequelize';
import type { IsoDate } from '../../server/care';
import { assembleDigests, type DigestLinks } from '../pass/assemble-digests';
import { localClock } from '../pass/calendar';
import { inLanes } from '../pass/lanes';
import { processBatch } from '../pass/process-batch';
import { refreshStatisticsIfStale } from '../pass/write-windows';
import type { Timings } from '../pass/timings';

// The day's pass for each site: refresh its care windows with the engine, decide who hears about
// what, then queue one digest per person. Mail goes out through the outbox (deliver-outbox.ts).
//
// Without `date`, a site is due once its local time is past 06:00 and its pass for that local day
// has not run: the hourly tick calls it so. With `date`, every site runs as if on that day
// (`npm run worker:once -- --date YYYY-MM-DD`).

export interface DailyPassDeps {
  db: Sequelize;
  links: DigestLinks;
  now?: () => Date;
  date?: IsoDate;
  batchSize?: number;
  /** Batches in flight at once: while PostgreSQL writes one, the engine works out the next. */
  lanes?: number;
  /** Set when the worker is asked to stop: the pass finishes its batch and leaves the rest for the next run. */
  signal?: AbortSignal;
  /** Called after each committed batch (the crash test pauses here). */
  afterBatch?: (count: number) => Promise<void>;
  log?: (msg: string, extra?: object) => void;
  /** Filled with the milliseconds each step took (for the benchmark). */
  timings?: Timings;
}

export interface DailyPassResult { dates: IsoDate[]; sites: number; failed: number; windowsWritten: number; reminders: number; digests: number }

/** Hour of the local day after which a site's pass may run. */
export const PASS_HOUR = 6;
const DEFAULT_BATCH = 250;
// Two suits the usual small server: one core for the engine, one for PostgreSQL's writing. Batches
// hold different sites, so lanes touch different windows; weekly-list keys are taken in order
// (decide-reminders.ts), so two lanes meeting on a group's list wait for each other, never deadlock.
const DEFAULT_LANES = 2;

async function dueSites(db: Sequelize, now: Date, date: IsoDate | undefined): Promise<Map<IsoDate, string[]>> {
  const sites = await db.query<{ id: string; time_zone: string }>('SELECT id, time_zone FROM sites WHERE archived_at IS NULL ORDER BY id', { type: QueryTypes.SELECT });
  const byDate = new Map<IsoDate, string[]>();
  for (const site of sites) {
    const clock = date ? { date, hour: 24 } : localClock(site.time_zone, now);
    if (!clock || clock.hour < PASS_HOUR) continue;
    const list = byDate.get(clock.date) ?? [];
    list.push(site.id);
    byDate.set(clock.date, list);
  }
  for (const [day, ids] of byDate) {
    const ran = await db.query<{ site_id: string }>(`SELECT site_id FROM site_passes WHERE date = $1::date AND status = 'done' AND site_id = ANY($2::uuid[])`, { bind: [day, ids], type: QueryTypes.SELECT });
    const done = new Set(ran.map((r) => r.site_id));
    byDate.set(day, ids.filter((id) => !done.has(id)));
  }
  return byDate;
}

export async function run({ db, links, now = () => new Date(), date, batchSize = DEFAULT_BATCH, lanes = DEFAULT_LANES, signal, afterBatch, log = () => {}, timings }: DailyPassDeps): Promise<DailyPassResult> {
  const worker = `${os.hostname()}:${process.pid}`;
  const result: DailyPassResult = { dates: [], sites: 0, failed: 0, windowsWritten: 0, reminders: 0, digests: 0 };
  let batches = 0;
  for (const [day, ids] of await dueSites(db, now(), date)) {
    result.dates.push(day);
    let from = 0;
    // While an afterBatch hook is pending (the crash test holds one open), no lane starts a batch.
    let hooks: Promise<unknown> = Promise.resolve();
    const lane = async () => {
      while (from < ids.length && !signal?.aborted) {
        await hooks;
        if (from >= ids.length || signal?.aborted) break;
        const siteIds = ids.slice(from, (from += batchSize));
        const batch = await processBatch(db, siteIds, day, worker, timings);
        result.sites += batch.claimed;
        result.failed += batch.failed;
        result.windowsWritten += batch.windowsWritten;
        result.reminders += batch.reminders;
        await refreshStatisticsIfStale(db, result.windowsWritten);
        if (batch.failed) log('some sites failed their pass', { date: day, failed: batch.failed });
        batches += 1;
        const hook = afterBatch?.(batches);
        hooks = Promise.all([hooks, hook]);
        await hook;
      }
    };
    await inLanes(lanes, lane);
    // Digests go out even when another worker did the sites: whoever gets here first queues them.
    if (!signal?.aborted) result.digests += await assembleDigests(db, day, links, timings, lanes);
  }
  return result;
}
