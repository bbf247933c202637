import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import type { IsoDate } from '../../server/care';
import { DEFAULT_LEAD_DAYS, LEAD_DAYS_MAX } from '../../server/schemas/reminders';
import { isMonday } from './calendar';

// Who hears about what, decided in the database for a whole batch of sites at once. Each decision
// is a reminder_deliveries row whose key can exist once: an opening or closing reminder once per
// person and window, a weekly list once per person, group and Monday. A rerun of the same day, or a
// second worker, finds the keys taken and adds nothing.

/** The engine's rule: a window is "closing" in its last 7 days (server/care/windows.ts). */
export const CLOSING_DAYS = 7;

// Shared conditions: reminders on, not paused on this day ($1 in both queries), and the task among the person's choices.
const wants = (flag: string) => `
  coalesce(rp.is_enabled, true) AND coalesce(rp.${flag}, true)
  AND (rp.paused_until IS NULL OR rp.paused_until < $1::date)`;

/** Windows are found through their groups' (group_id, opens, closes) index, then kept to the batch's sites. */
export async function decideReminders(db: Sequelize, t: Transaction, sites: { id: string; groupId: string }[], date: IsoDate): Promise<Map<string, number>> {
  const counts = new Map<string, number>();
  if (!sites.length) return counts;
  const siteIds = sites.map((s) => s.id);
  const groupIds = [...new Set(sites.map((s) => s.groupId))];
  // A window shorter than a week is "closing" from its first day: its opening reminder says enough.
  const rows = await db.query<{ site_id: string; n: string }>(
    `WITH due AS (
       SELECT m.user_id, cw.group_id, cw.id AS window_id,
         CASE WHEN cw.opens >= $1::date THEN 'opening' ELSE 'closing' END AS kind
       FROM care_windows cw
       JOIN plants p ON p.id = cw.plant_id AND p.archived_at IS NULL
       JOIN memberships m ON m.group_id = cw.group_id
       LEFT JOIN reminder_preferences rp ON rp.user_id = m.user_id
       WHERE cw.group_id = ANY($3::uuid[]) AND cw.site_id = ANY($4::uuid[]) AND cw.done_at IS NULL
         -- The window's own dates first, so only the few windows near this day meet the members.
         AND (cw.opens BETWEEN $1::date AND $1::date + ${LEAD_DAYS_MAX} OR cw.closes BETWEEN $1::date AND $1::date + ${CLOSING_DAYS - 1})
         AND (rp.tasks IS NULL OR cw.task = ANY(rp.tasks))
         AND (
           (cw.opens BETWEEN $1::date AND $1::date + coalesce(rp.lead_days, $2::int) AND ${wants('is_opening_on')})
           OR (cw.opens < $1::date AND cw.closes BETWEEN $1::date AND $1::date + ${CLOSING_DAYS - 1}
               AND cw.closes - cw.opens >= ${CLOSING_DAYS} AND ${wants('is_closing_on')})
         )
     ), inserted AS (
       INSERT INTO reminder_deliveries (delivery_key, user_id, group_id, window_id, kind, pass_date)
       SELECT kind || ':' || user_id || ':' || window_id, user_id, group_id, window_id, kind, $1::date FROM due
       ON CONFLICT (delivery_key) DO NOTHING
       RETURNING window_id
     )
     SELECT cw.site_id, count(*) AS n FROM inserted JOIN care_windows cw ON cw.id = inserted.window_id GROUP BY cw.site_id`,
    { bind: [date, DEFAULT_LEAD_DAYS, groupIds, siteIds], transaction: t, type: QueryTypes.SELECT },
  );
  for (const r of rows) counts.set(r.site_id, Number(r.n));
  if (isMonday(date)) await decideWeeklyLists(db, t, siteIds, date);
  return counts;
}

/**
 * The first site of a group to pass on a Monday puts the group's weekly list in each member's digest.
 * Two batches holding sites of one group may run at once: taking the keys in order means one waits
 * for the other rather than each waiting for the other.
 */
async function decideWeeklyLists(db: Sequelize, t: Transaction, siteIds: string[], date: IsoDate): Promise<void> {
  await db.query(
    `INSERT INTO reminder_deliveries (delivery_key, user_id, group_id, window_id, kind, pass_date)
     SELECT DISTINCT 'weekly:' || m.user_id || ':' || s.group_id || ':' || $1::text AS delivery_key, m.user_id, s.group_id, NULL::uuid, 'weekly', $1::date
     FROM sites s
     JOIN memberships m ON m.group_id = s.group_id
     LEFT JOIN reminder_preferences rp ON rp.user_id = m.user_id
     WHERE s.id = ANY($2::uuid[]) AND ${wants('is_weekly_on')}
     ORDER BY delivery_key
     ON CONFLICT (delivery_key) DO NOTHING`,
    { bind: [date, siteIds], transaction: t },
  );
}
