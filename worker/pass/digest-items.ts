import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import type { IsoDate } from '../../server/care';

// The reads behind a day's digests: the reminders waiting for each person, the weekly job lists of
// their groups, and the plants and sites those mention.

export interface WaitingItem {
  id: string; userId: string; email: string; name: string; kind: 'opening' | 'closing' | 'weekly' | 'assigned'; groupId: string; passDate: string;
  isWanted: boolean; tasks: string[] | null; windowId: string | null; plantId: string | null; task: string | null; opens: string | null; closes: string | null;
  basis: 'readings' | 'projection' | 'calendar' | null; reason: string | null; isDone: boolean;
  degreeDays: number | null; baseC: number | null; since: string | null; reachedOn: string | null;
}

/**
 * People with something waiting, in the order of their first group, so that a chunk of people holds
 * whole groups and each group's week jobs and plants are read about once.
 */
export async function waitingUsers(db: Sequelize, date: IsoDate): Promise<string[]> {
  const rows = await db.query<{ user_id: string }>(
    `SELECT user_id FROM reminder_deliveries WHERE digest_key IS NULL AND pass_date <= $1::date
     GROUP BY user_id ORDER BY min(group_id::text), user_id`,
    { bind: [date], type: QueryTypes.SELECT },
  );
  return rows.map((r) => r.user_id);
}

/** Rows are locked, so a second worker assembling at the same time waits and then finds them taken. */
export async function waitingItems(db: Sequelize, t: Transaction, userIds: string[], date: IsoDate): Promise<WaitingItem[]> {
  return db.query<WaitingItem>(
    `SELECT rd.id, rd.user_id AS "userId", u.email, u.name, rd.kind, rd.group_id AS "groupId", to_char(rd.pass_date, 'YYYY-MM-DD') AS "passDate",
       (coalesce(rp.is_enabled, true) AND (rp.paused_until IS NULL OR rp.paused_until < $2::date)
         AND EXISTS (SELECT 1 FROM memberships m WHERE m.user_id = rd.user_id AND m.group_id = rd.group_id)) AS "isWanted",
       rp.tasks, rd.window_id AS "windowId", cw.plant_id AS "plantId", cw.task,
       to_char(cw.opens, 'YYYY-MM-DD') AS opens, to_char(cw.closes, 'YYYY-MM-DD') AS closes, cw.basis, wd.reason,
       cw.done_at IS NOT NULL AS "isDone", cw.trigger_degree_days AS "degreeDays", cw.trigger_base_c AS "baseC",
       to_char(cw.trigger_since, 'YYYY-MM-DD') AS since, to_char(cw.trigger_reached_on, 'YYYY-MM-DD') AS "reachedOn"
     FROM reminder_deliveries rd
     JOIN users u ON u.id = rd.user_id
     LEFT JOIN reminder_preferences rp ON rp.user_id = rd.user_id
     LEFT JOIN care_windows cw ON cw.id = rd.window_id
     LEFT JOIN care_window_wordings wd ON wd.id = cw.wording_id
     WHERE rd.user_id = ANY($1::uuid[]) AND rd.digest_key IS NULL AND rd.pass_date <= $2::date
     ORDER BY rd.user_id, rd.created_at
     FOR UPDATE OF rd`,
    { bind: [userIds, date], transaction: t, type: QueryTypes.SELECT },
  );
}

export interface WeekJob { groupId: string; plantId: string; task: string; opens: string; closes: string; groupTotal: number }

/** How many of a group's week jobs are read: enough for the list even after a person's task filter. */
export const WEEK_JOBS_READ = 60;

/**
 * The jobs open at some point in the seven days from `date`, not yet done, per group: those that
 * close this week first, then those that open this week, then the ones open all week. Read group by
 * group through the (group_id, opens, closes) index, so a chunk of people never reads the whole table;
 * `groupTotal` counts them all, beyond the ones read.
 */
export async function weekJobs(db: Sequelize, t: Transaction, groupIds: string[], date: IsoDate): Promise<WeekJob[]> {
  if (!groupIds.length) return [];
  return db.query<WeekJob>(
    `SELECT g.id AS "groupId", w.plant_id AS "plantId", w.task, w.opens, w.closes, w.total AS "groupTotal"
     FROM unnest($1::uuid[]) AS g(id)
     CROSS JOIN LATERAL (
       SELECT cw.plant_id, cw.task, to_char(cw.opens, 'YYYY-MM-DD') AS opens, to_char(cw.closes, 'YYYY-MM-DD') AS closes, count(*) OVER () AS total
       FROM care_windows cw
       JOIN plants p ON p.id = cw.plant_id AND p.archived_at IS NULL
       JOIN sites s ON s.id = cw.site_id AND s.archived_at IS NULL
       WHERE cw.group_id = g.id AND cw.opens <= $2::date + 6 AND cw.closes >= $2::date AND cw.done_at IS NULL
       ORDER BY CASE WHEN cw.closes <= $2::date + 6 THEN 0 WHEN cw.opens >= $2::date THEN 1 ELSE 2 END, s.name, p.position_label, p.id, cw.opens
       LIMIT $3
     ) AS w`,
    { bind: [groupIds, date, WEEK_JOBS_READ], transaction: t, type: QueryTypes.SELECT },
  );
}

export interface DigestPlant { id: string; siteId: string; typeCode: string; cultivar: string; form: string; positionLabel: string; heightM: number | null }
export interface DigestSite { id: string; name: string; groupName: string; latitude: number; longitude: number; timeZone: string; hazards: string[] }

export async function plantsAndSites(db: Sequelize, t: Transaction, plantIds: string[]): Promise<{ plants: Map<string, DigestPlant>; sites: Map<string, DigestSite> }> {
  const rows = await db.query<DigestPlant & { siteName: string; groupName: string; latitude: number; longitude: number; timeZone: string; hazards: string[] }>(
    `SELECT p.id, p.site_id AS "siteId", p.type_code AS "typeCode", p.cultivar, p.form, p.position_label AS "positionLabel", p.height_m AS "heightM",
       s.name AS "siteName", g.name AS "groupName", s.latitude, s.longitude, s.time_zone AS "timeZone", s.hazards
     FROM plants p JOIN sites s ON s.id = p.site_id JOIN groups g ON g.id = p.group_id
     WHERE p.id = ANY($1::uuid[])`,
    { bind: [plantIds], transaction: t, type: QueryTypes.SELECT },
  );
  const plants = new Map<string, DigestPlant>();
  const sites = new Map<string, DigestSite>();
  for (const r of rows) {
    plants.set(r.id, { id: r.id, siteId: r.siteId, typeCode: r.typeCode, cultivar: r.cultivar, form: r.form, positionLabel: r.positionLabel, heightM: r.heightM });
    sites.set(r.siteId, { id: r.siteId, name: r.siteName, groupName: r.groupName, latitude: r.latitude, longitude: r.longitude, timeZone: r.timeZone, hazards: r.hazards });
  }
  return { plants, sites };
}
