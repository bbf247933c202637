import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import type { IsoDate } from '../../server/care';
import type { HealthFlag, PlantForm, PlantTypeCode } from '../../server/schemas/catalogue';
import { loadSiteClimates } from '../../server/services/site-climate.service';
import { seasonOf } from './calendar';
import { decideReminders } from './decide-reminders';
import { timed, type Timings } from './timings';
import { siteWindows, WindowColumns, type Climate, type PassPlant, type PassSite } from './window-rows';
import { deleteStaleWindows, upsertWindows } from './write-windows';

// One batch of sites for one date, in one transaction: claim the sites, refresh their windows,
// decide who hears about what, and record the pass. A second worker trying the same sites waits on
// the claim rows and then finds them taken; a worker that dies leaves no partial batch behind.

export interface BatchResult { claimed: number; failed: number; windowsWritten: number; reminders: number }

interface SiteOutcome { siteId: string; status: 'done' | 'failed'; plants: number; windowsWritten: number; reminders: number; fingerprint: string | null; error: string | null }

async function claim(db: Sequelize, t: Transaction, siteIds: string[], date: IsoDate, worker: string): Promise<string[]> {
  // A failed site is tried again by the next run for the same date; a done one never is.
  const rows = await db.query<{ site_id: string }>(
    `INSERT INTO site_passes (site_id, date, status, started_at, worker)
     SELECT id, $2::date, 'done', now(), $3 FROM unnest($1::uuid[]) AS s(id) ORDER BY id
     ON CONFLICT (site_id, date) DO UPDATE SET status = 'done', started_at = now(), worker = EXCLUDED.worker, error = NULL
       WHERE site_passes.status = 'failed'
     RETURNING site_id`,
    { bind: [siteIds, date, worker], transaction: t, type: QueryTypes.SELECT },
  );
  return rows.map((r) => r.site_id);
}

// The plants are locked against deletion until the batch commits: care_windows has no foreign key
// to check each window's plant (see the migration 20261206-0003), so this stands in for it.
async function loadBatch(db: Sequelize, t: Transaction, siteIds: string[]) {
  const sites = await db.query<PassSite>(
    `SELECT id, group_id AS "groupId", latitude, longitude, time_zone AS "timeZone" FROM sites WHERE id = ANY($1::uuid[])`,
    { bind: [siteIds], transaction: t, type: QueryTypes.SELECT },
  );
  const plants = await db.query<PassPlant>(
    `SELECT id, group_id AS "groupId", site_id AS "siteId", type_code AS "typeCode", form, planted_year AS "plantedYear", health_flags AS "healthFlags"
     FROM plants WHERE site_id = ANY($1::uuid[]) AND archived_at IS NULL ORDER BY site_id, id
     FOR KEY SHARE`,
    { bind: [siteIds], transaction: t, type: QueryTypes.SELECT },
  );
  const bySite = new Map<string, PassPlant[]>(sites.map((s) => [s.id, []]));
  for (const p of plants) bySite.get(p.siteId)?.push({ ...p, typeCode: p.typeCode as PlantTypeCode, form: p.form as PlantForm, healthFlags: p.healthFlags as HealthFlag[] });
  return { sites, bySite };
}

// Readings and normals for each site's current season, two queries per season however many sites.
// Next season's windows (refreshed from October in the north) lie wholly in the future, so they
// need only the normals, which do not change from season to season.
async function climatesFor(sites: PassSite[], date: IsoDate): Promise<Map<string, Map<number, Climate>>> {
  const out = new Map<string, Map<number, Climate>>(sites.map((s) => [s.id, new Map()]));
  const bySeason = new Map<number, PassSite[]>();
  for (const site of sites) {
    const season = seasonOf(date, site.latitude);
    const list = bySeason.get(season) ?? [];
    list.push(site);
    bySeason.set(season, list);
  }
  for (const [season, list] of bySeason) {
    for (const [siteId, climate] of await loadSiteClimates(list, season)) {
      out.get(siteId)?.set(season, climate);
      out.get(siteId)?.set(season + 1, { readings: [], normals: climate.normals });
    }
  }
  return out;
}

async function previousFingerprints(db: Sequelize, t: Transaction, siteIds: string[], date: IsoDate): Promise<Map<string, string>> {
  const rows = await db.query<{ site_id: string; fingerprint: string }>(
    `SELECT DISTINCT ON (site_id) site_id, fingerprint FROM site_passes
     WHERE site_id = ANY($1::uuid[]) AND date <> $2::date AND status = 'done' AND fingerprint IS NOT NULL
     ORDER BY site_id, finished_at DESC`,
    { bind: [siteIds, date], transaction: t, type: QueryTypes.SELECT },
  );
  return new Map(rows.map((r) => [r.site_id, r.fingerprint]));
}

async function recordOutcomes(db: Sequelize, t: Transaction, date: IsoDate, outcomes: SiteOutcome[]): Promise<void> {
  await db.query(
    `UPDATE site_passes sp SET status = o.status, finished_at = now(), plants = o.plants, windows_written = o.written,
       reminders = o.reminders, fingerprint = o.fingerprint, error = o.error
     FROM unnest($1::uuid[], $2::text[], $3::int[], $4::int[], $5::int[], $6::text[], $7::text[]) AS o(site_id, status, plants, written, reminders, fingerprint, error)
     WHERE sp.site_id = o.site_id AND sp.date = $8::date`,
    {
      bind: [outcomes.map((o) => o.siteId), outcomes.map((o) => o.status), outcomes.map((o) => o.plants), outcomes.map((o) => o.windowsWritten),
        outcomes.map((o) => o.reminders), outcomes.map((o) => o.fingerprint), outcomes.map((o) => o.error), date],
      transaction: t,
    },
  );
}

/**
 * Every site's windows from the engine. A site whose windows match its last pass's fingerprint
 * writes nothing; a site whose plants the engine refuses is recorded as failed and writes nothing.
 */
function workOutWindows(sites: PassSite[], bySite: Map<string, PassPlant[]>, climates: Map<string, Map<number, Climate>>, previous: Map<string, string>, date: IsoDate) {
  const changed = new WindowColumns();
  const changedSeasons: { siteId: string; groupId: string; season: number }[] = [];
  const outcomes = new Map<string, SiteOutcome>();
  for (const site of sites) {
    const plants = bySite.get(site.id) ?? [];
    const before = changed.length;
    const outcome: SiteOutcome = { siteId: site.id, status: 'done', plants: plants.length, windowsWritten: 0, reminders: 0, fingerprint: null, error: null };
    try {
      const result = siteWindows(site, plants, climates.get(site.id) ?? new Map(), date, changed);
      outcome.fingerprint = result.fingerprint;
      const last = previous.get(site.id);
      if (last === result.fingerprint) changed.truncate(before);
      // A site's first pass has nothing stale to look for: only passes write windows.
      else if (last !== undefined) for (const season of result.seasons) changedSeasons.push({ siteId: site.id, groupId: site.groupId, season });
    } catch (err) {
      changed.truncate(before);
      Object.assign(outcome, { status: 'failed', fingerprint: null, error: String(err).slice(0, 2000) });
    }
    outcomes.set(site.id, outcome);
  }
  return { changed, changedSeasons, outcomes };
}

export async function processBatch(db: Sequelize, siteIds: string[], date: IsoDate, worker: string, timings?: Timings): Promise<BatchResult> {
  return db.transaction(async (t) => {
    const claimed = await timed(timings, 'claim', () => claim(db, t, [...siteIds].sort(), date, worker));
    if (!claimed.length) return { claimed: 0, failed: 0, windowsWritten: 0, reminders: 0 };
    const { sites, bySite } = await timed(timings, 'read plants', () => loadBatch(db, t, claimed));
    const climates = await timed(timings, 'read readings', () => climatesFor(sites, date));
    const previous = await timed(timings, 'claim', () => previousFingerprints(db, t, claimed, date));
    const { changed, changedSeasons, outcomes } = await timed(timings, 'work out windows', () => workOutWindows(sites, bySite, climates, previous, date));
    // A batch whose changed sites all lack a fingerprint is their first pass: nothing to update.
    const fresh = changedSeasons.length === 0;
    for (const [siteId, written] of await timed(timings, 'write windows', () => upsertWindows(db, t, changed, fresh))) outcomes.get(siteId)!.windowsWritten = written;
    await timed(timings, 'delete stale', () => deleteStaleWindows(db, t, changed, changedSeasons));
    const done = sites.filter((s) => outcomes.get(s.id)!.status === 'done');
    for (const [siteId, count] of await timed(timings, 'decide reminders', () => decideReminders(db, t, done, date))) outcomes.get(siteId)!.reminders = count;
    await timed(timings, 'claim', () => recordOutcomes(db, t, date, [...outcomes.values()]));
    const list = [...outcomes.values()];
    return {
      claimed: claimed.length,
      failed: list.filter((o) => o.status === 'failed').length,
      windowsWritten: list.reduce((n, o) => n + o.windowsWritten, 0),
      reminders: list.reduce((n, o) => n + o.reminders, 0),
    };
  });
}
