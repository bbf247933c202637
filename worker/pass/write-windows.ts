import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import type { WindowColumns } from './window-rows';

// Bulk writes of care windows: one multi-row upsert per chunk (arrays unnested on the server), so
// a batch of sites costs a handful of round trips however many plants it holds.

const CHUNK = 10_000;

const slice = <T>(values: T[], from: number) => values.slice(from, from + CHUNK);

/**
 * The window texts (reason, source, how-to) repeat across every plant of a type at a site, so each
 * distinct text travels once and rows carry its number: a fraction of the bytes to send and parse.
 */
function dictionary(values: (string | null)[][]): { texts: string[]; indexes: (number | null)[][] } {
  const numbers = new Map<string, number>();
  const texts: string[] = [];
  const indexes = values.map((column) => column.map((text) => {
    if (text === null) return null;
    let n = numbers.get(text);
    if (n === undefined) {
      texts.push(text);
      n = texts.length;
      numbers.set(text, n);
    }
    return n;
  }));
  return { texts, indexes };
}

/**
 * Inserts new windows and updates the ones whose dates or words changed; an unchanged row is left
 * alone, so its id, done_at and computed_at stay as they were. Answers rows written per site.
 */
export async function upsertWindows(db: Sequelize, t: Transaction, c: WindowColumns): Promise<Map<string, number>> {
  const written = new Map<string, number>();
  for (let from = 0; from < c.length; from += CHUNK) {
    const { texts, indexes } = dictionary([slice(c.source, from), slice(c.reason, from), slice(c.detail, from)]);
    const rows = await db.query<{ site_id: string; n: string }>(
      `WITH texts AS (SELECT * FROM unnest($17::text[]) WITH ORDINALITY AS t(text, n)),
       written AS (
         INSERT INTO care_windows (plant_id, group_id, site_id, season, task, rule_key, opens, closes, basis, source, reason, detail,
           trigger_degree_days, trigger_base_c, trigger_since, trigger_reached_on, computed_at)
         SELECT w.plant_id, w.group_id, w.site_id, w.season, w.task, w.rule_key, w.opens, w.closes, w.basis, s.text, r.text, d.text,
           w.dd, w.base, w.since, w.reached, now()
         FROM unnest($1::uuid[], $2::uuid[], $3::uuid[], $4::int[], $5::text[], $6::text[], $7::date[], $8::date[],
           $9::text[], $10::int[], $11::int[], $12::int[], $13::real[], $14::real[], $15::date[], $16::date[])
           AS w(plant_id, group_id, site_id, season, task, rule_key, opens, closes, basis, source_n, reason_n, detail_n, dd, base, since, reached)
         JOIN texts s ON s.n = w.source_n
         JOIN texts r ON r.n = w.reason_n
         LEFT JOIN texts d ON d.n = w.detail_n
         ON CONFLICT (plant_id, season, rule_key) DO UPDATE SET
           group_id = EXCLUDED.group_id, site_id = EXCLUDED.site_id, task = EXCLUDED.task, opens = EXCLUDED.opens, closes = EXCLUDED.closes,
           basis = EXCLUDED.basis, source = EXCLUDED.source, reason = EXCLUDED.reason, detail = EXCLUDED.detail,
           trigger_degree_days = EXCLUDED.trigger_degree_days, trigger_base_c = EXCLUDED.trigger_base_c,
           trigger_since = EXCLUDED.trigger_since, trigger_reached_on = EXCLUDED.trigger_reached_on,
           computed_at = EXCLUDED.computed_at, updated_at = now()
         WHERE (care_windows.group_id, care_windows.site_id, care_windows.task, care_windows.opens, care_windows.closes, care_windows.basis,
                care_windows.source, care_windows.reason, care_windows.detail, care_windows.trigger_degree_days, care_windows.trigger_reached_on)
           IS DISTINCT FROM (EXCLUDED.group_id, EXCLUDED.site_id, EXCLUDED.task, EXCLUDED.opens, EXCLUDED.closes, EXCLUDED.basis,
                EXCLUDED.source, EXCLUDED.reason, EXCLUDED.detail, EXCLUDED.trigger_degree_days, EXCLUDED.trigger_reached_on)
         RETURNING site_id)
       SELECT site_id, count(*) AS n FROM written GROUP BY site_id`,
      {
        bind: [
          slice(c.plantId, from), slice(c.groupId, from), slice(c.siteId, from), slice(c.season, from), slice(c.task, from), slice(c.ruleKey, from),
          slice(c.opens, from), slice(c.closes, from), slice(c.basis, from), indexes[0], indexes[1], indexes[2],
          slice(c.triggerDegreeDays, from), slice(c.triggerBase, from), slice(c.triggerSince, from), slice(c.triggerReachedOn, from), texts,
        ],
        transaction: t,
        type: QueryTypes.SELECT,
      },
    );
    for (const r of rows) written.set(r.site_id, (written.get(r.site_id) ?? 0) + Number(r.n));
  }
  return written;
}

/**
 * Removes windows a refreshed site no longer has (a plant archived or moved, its form changed, a
 * rule withdrawn). A window someone marked done stays, because the work log points at it.
 */
/**
 * The first pass over many sites fills care_windows from nothing, and PostgreSQL would go on
 * planning for an empty table (reading all of it for every batch) until autovacuum caught up:
 * once a pass has written more rows than the table's statistics know of, they are refreshed.
 */
export async function refreshStatisticsIfStale(db: Sequelize, writtenThisPass: number): Promise<boolean> {
  if (writtenThisPass < 10_000) return false;
  const [row] = await db.query<{ tuples: number }>(`SELECT reltuples AS tuples FROM pg_class WHERE oid = 'care_windows'::regclass`, { type: QueryTypes.SELECT });
  if (row && row.tuples * 2 > writtenThisPass) return false;
  await db.query('ANALYZE care_windows');
  return true;
}

export async function deleteStaleWindows(db: Sequelize, t: Transaction, c: WindowColumns, refreshed: { siteId: string; season: number }[]): Promise<void> {
  if (!refreshed.length) return;
  await db.query(
    `DELETE FROM care_windows cw
     WHERE cw.site_id = ANY($1::uuid[])
       AND (cw.site_id, cw.season) IN (SELECT * FROM unnest($1::uuid[], $2::int[]))
       AND cw.done_at IS NULL
       AND NOT EXISTS (SELECT 1 FROM unnest($3::uuid[], $4::int[], $5::text[]) AS k(plant_id, season, rule_key)
                       WHERE k.plant_id = cw.plant_id AND k.season = cw.season AND k.rule_key = cw.rule_key)`,
    { bind: [refreshed.map((r) => r.siteId), refreshed.map((r) => r.season), c.plantId, c.season, c.ruleKey], transaction: t },
  );
}
