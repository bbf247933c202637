import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import type { WindowColumns } from './window-rows';

// Bulk writes of care windows: one multi-row upsert per chunk (arrays unnested on the server), so
// a batch of sites costs a handful of round trips however many plants it holds.

const CHUNK = 10_000;

// Array parameters go as PostgreSQL array literals made here: uuids, dates, numbers and catalogue
// codes need no quoting, and node-postgres would otherwise escape each of a pass's millions of
// elements one by one. A code that would need quoting is refused (it never should: codes are
// letters, digits and hyphens).
const SAFE_CODE = /^[A-Za-z0-9-]+$/;
const checkedCodes = new Set<string>();
function literal(values: readonly (string | number | null)[], from = 0, to = values.length, codes = false): string {
  const part = values.slice(from, to);
  if (codes) {
    for (const code of part) {
      if (typeof code === 'string' && !checkedCodes.has(code)) {
        if (!SAFE_CODE.test(code)) throw new Error(`Unexpected character in code ${JSON.stringify(code)}`);
        checkedCodes.add(code);
      }
    }
  }
  return `{${part.map((v) => v ?? 'NULL').join(',')}}`;
}

// A window's wording (source, reason, how-to) is the same for every plant of a kind at a site:
// each distinct one travels once, is stored once (care_window_wordings, named by a hash of its
// text) and rows carry its number in the chunk.
// Nested maps rather than one joined key: the engine hands out the same string objects, whose
// hashes V8 keeps, so a lookup costs no new string.
function wordings(c: WindowColumns, from: number, to: number) {
  const numbers = new Map<string, Map<string, Map<string | null, number>>>();
  const source: string[] = [];
  const reason: string[] = [];
  const detail: (string | null)[] = [];
  const rowWording: number[] = [];
  for (let i = from; i < to; i++) {
    const bySource = numbers.get(c.reason[i]!) ?? numbers.set(c.reason[i]!, new Map()).get(c.reason[i]!)!;
    const byDetail = bySource.get(c.source[i]!) ?? bySource.set(c.source[i]!, new Map()).get(c.source[i]!)!;
    let n = byDetail.get(c.detail[i]!);
    if (n === undefined) {
      source.push(c.source[i]!);
      reason.push(c.reason[i]!);
      detail.push(c.detail[i]!);
      n = source.length;
      byDetail.set(c.detail[i]!, n);
    }
    rowWording.push(n);
  }
  return { source, reason, detail, rowWording };
}

/**
 * Stores the wordings not stored yet, in a transaction of their own: a wording is the same whoever
 * writes it, so it may as well stay when the batch that wrote it fails, and batches running at
 * once then never hold each other's wordings locked. In id order, so two writers of the same new
 * wordings queue behind each other rather than deadlock.
 */
async function saveWordings(db: Sequelize, w: { source: string[]; reason: string[]; detail: (string | null)[] }): Promise<void> {
  await db.query(
    `INSERT INTO care_window_wordings (id, source, reason, detail)
     SELECT care_window_wording_id(source, reason, detail) AS id, source, reason, detail
     FROM unnest($1::text[], $2::text[], $3::text[]) AS t(source, reason, detail)
     ORDER BY id
     ON CONFLICT (id) DO NOTHING`,
    { bind: [w.source, w.reason, w.detail] },
  );
}

const UPSERT = `ON CONFLICT (id) DO UPDATE SET
  group_id = EXCLUDED.group_id, site_id = EXCLUDED.site_id, task = EXCLUDED.task, opens = EXCLUDED.opens, closes = EXCLUDED.closes,
  basis = EXCLUDED.basis, wording_id = EXCLUDED.wording_id,
  trigger_degree_days = EXCLUDED.trigger_degree_days, trigger_base_c = EXCLUDED.trigger_base_c,
  trigger_since = EXCLUDED.trigger_since, trigger_reached_on = EXCLUDED.trigger_reached_on,
  computed_at = EXCLUDED.computed_at, updated_at = now()
WHERE (care_windows.group_id, care_windows.site_id, care_windows.task, care_windows.opens, care_windows.closes, care_windows.basis,
       care_windows.wording_id, care_windows.trigger_degree_days, care_windows.trigger_reached_on)
  IS DISTINCT FROM (EXCLUDED.group_id, EXCLUDED.site_id, EXCLUDED.task, EXCLUDED.opens, EXCLUDED.closes, EXCLUDED.basis,
       EXCLUDED.wording_id, EXCLUDED.trigger_degree_days, EXCLUDED.trigger_reached_on)`;

/** One chunk of windows, inserted, or upserted when `upsert`; answers rows written per site. */
function writeChunk(db: Sequelize, t: Transaction, bind: unknown[], upsert: boolean) {
  return db.query<{ site_id: string; n: string }>(
    `WITH wordings AS (
       SELECT n, care_window_wording_id(source, reason, detail) AS id
       FROM unnest($14::text[], $15::text[], $16::text[]) WITH ORDINALITY AS t(source, reason, detail, n)),
     places AS (SELECT * FROM unnest($2::uuid[], $3::uuid[], $4::int[]) WITH ORDINALITY AS p(site_id, group_id, season, n)),
     written AS (
       INSERT INTO care_windows (plant_id, group_id, site_id, season, task, rule_key, opens, closes, basis, wording_id,
         trigger_degree_days, trigger_base_c, trigger_since, trigger_reached_on, computed_at)
       SELECT w.plant_id, pl.group_id, pl.site_id, pl.season, w.task, w.rule_key, w.opens, w.closes, w.basis, wd.id,
         w.dd, w.base, w.since, w.reached, now()
       FROM unnest($1::uuid[], $18::int[], $5::text[], $6::text[], $7::date[], $8::date[],
         $9::text[], $10::int[], $11::real[], $12::real[], $13::date[], $17::date[])
         AS w(plant_id, place, task, rule_key, opens, closes, basis, wording_n, dd, base, since, reached)
       JOIN places pl ON pl.n = w.place
       JOIN wordings wd ON wd.n = w.wording_n
       ${upsert ? UPSERT : ''}
       RETURNING site_id)
     SELECT site_id, count(*) AS n FROM written GROUP BY site_id`,
    { bind, transaction: t, type: QueryTypes.SELECT },
  );
}

const isUniqueViolation = (err: unknown) => (err as { parent?: { code?: string } }).parent?.code === '23505';

/**
 * Inserts new windows and updates the ones whose dates or words changed; an unchanged row is left
 * alone, so its done_at and computed_at stay as they were. A window's id follows from its plant,
 * season and rule (care_window_id() in the database), so the upsert meets yesterday's row by it.
 *
 * `fresh` says none of these sites has windows yet (their first pass): each chunk is then tried as
 * a plain insert, a fifth cheaper than the upsert, and upserted after all if some window turns out
 * to exist (a plant that moved here from a site already passed). Answers rows written per site.
 */
export async function upsertWindows(db: Sequelize, t: Transaction, c: WindowColumns, fresh = false): Promise<Map<string, number>> {
  const written = new Map<string, number>();
  for (let from = 0; from < c.length; from += CHUNK) {
    const to = Math.min(from + CHUNK, c.length);
    const w = wordings(c, from, to);
    await saveWordings(db, w);
    const bind = [
      literal(c.plantId, from, to), literal(c.places.map((p) => p.siteId)), literal(c.places.map((p) => p.groupId)), literal(c.places.map((p) => p.season)),
      literal(c.task, from, to, true), literal(c.ruleKey, from, to, true), literal(c.opens, from, to), literal(c.closes, from, to), literal(c.basis, from, to, true),
      literal(w.rowWording), literal(c.triggerDegreeDays, from, to), literal(c.triggerBase, from, to), literal(c.triggerSince, from, to),
      w.source, w.reason, w.detail, literal(c.triggerReachedOn, from, to), literal(c.place, from, to),
    ];
    let rows: { site_id: string; n: string }[];
    if (fresh) {
      await db.query('SAVEPOINT fresh_windows', { transaction: t });
      try {
        rows = await writeChunk(db, t, bind, false);
        await db.query('RELEASE SAVEPOINT fresh_windows', { transaction: t });
      } catch (err) {
        if (!isUniqueViolation(err)) throw err;
        await db.query('ROLLBACK TO SAVEPOINT fresh_windows', { transaction: t });
        rows = await writeChunk(db, t, bind, true);
      }
    } else {
      rows = await writeChunk(db, t, bind, true);
    }
    for (const r of rows) written.set(r.site_id, (written.get(r.site_id) ?? 0) + Number(r.n));
  }
  return written;
}

/**
 * The first pass over many sites fills care_windows from nothing, and PostgreSQL would go on
 * planning for an empty table (reading all of it for every batch) until autovacuum caught up:
 * once a pass has written eight times the rows the table's statistics know of, they are refreshed
 * (between refreshes the planner scales the row count with the table's size by itself).
 */
export async function refreshStatisticsIfStale(db: Sequelize, writtenThisPass: number): Promise<boolean> {
  if (writtenThisPass < 10_000) return false;
  const [row] = await db.query<{ tuples: number }>(`SELECT reltuples AS tuples FROM pg_class WHERE oid = 'care_windows'::regclass`, { type: QueryTypes.SELECT });
  if (row && row.tuples * 8 > writtenThisPass) return false;
  await db.query('ANALYZE care_windows');
  return true;
}

/**
 * Removes the windows of a refreshed site's plants that the engine no longer gives them (a plant
 * archived, its form changed, a rule withdrawn). A plant that moved here takes its windows along:
 * their ids are its own, so the upsert above gave them this site. A window someone marked done
 * stays, because the work log points at it.
 */
export async function deleteStaleWindows(db: Sequelize, t: Transaction, c: WindowColumns, refreshed: { siteId: string; groupId: string; season: number }[]): Promise<void> {
  if (!refreshed.length) return;
  await db.query(
    `DELETE FROM care_windows cw USING plants p
     WHERE cw.group_id = ANY($6::uuid[]) AND p.id = cw.plant_id AND p.site_id = ANY($1::uuid[])
       AND (p.site_id, cw.season) IN (SELECT * FROM unnest($1::uuid[], $2::int[]))
       AND cw.done_at IS NULL
       AND NOT EXISTS (SELECT 1 FROM unnest($3::uuid[], $4::int[], $5::text[]) AS k(plant_id, season, rule_key)
                       WHERE k.plant_id = cw.plant_id AND k.season = cw.season AND k.rule_key = cw.rule_key)`,
    {
      bind: [refreshed.map((r) => r.siteId), refreshed.map((r) => r.season), c.plantId, c.seasons(), c.ruleKey, [...new Set(refreshed.map((r) => r.groupId))]],
      transaction: t,
    },
  );
}
