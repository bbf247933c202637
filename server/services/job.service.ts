import { QueryTypes, type Transaction } from 'sequelize';
import { addDays, todayIn, windowState } from '../care';
import { sequelize } from '../db';
import { conflict, notFound, validationFailed } from '../lib/errors';
import { roleRank, type Role } from '../schemas/group';
import type { Job, JobList } from '../schemas/team';
import { groupToday, plantTitle } from './group-today';

// Jobs are care windows handed to a person. Growers and owners hand them out; the person sees them
// under "My jobs" and, once, in their next digest (a reminder_deliveries row of kind 'assigned').

interface JobRow {
  windowId: string; plantId: string; cultivar: string; typeCode: string; siteName: string; timeZone: string; positionLabel: string;
  task: string; opens: string; closes: string; assignedTo: string | null; assigneeName: string | null; doneAt: Date | null;
}

const jobColumns = `cw.id AS "windowId", cw.plant_id AS "plantId", p.cultivar, p.type_code AS "typeCode", s.name AS "siteName", s.time_zone AS "timeZone",
  p.position_label AS "positionLabel", cw.task, to_char(cw.opens, 'YYYY-MM-DD') AS opens, to_char(cw.closes, 'YYYY-MM-DD') AS closes,
  cw.assigned_to AS "assignedTo", u.name AS "assigneeName", cw.done_at AS "doneAt"`;
const jobFrom = `FROM care_windows cw
  JOIN plants p ON p.id = cw.plant_id AND p.archived_at IS NULL
  JOIN sites s ON s.id = cw.site_id AND s.archived_at IS NULL
  LEFT JOIN users u ON u.id = cw.assigned_to`;

function toJob(r: JobRow, now: Date): Job {
  const state = windowState(r.opens, r.closes, todayIn(r.timeZone, now));
  return {
    windowId: r.windowId, plantId: r.plantId, plantName: plantTitle(r), typeCode: r.typeCode, siteName: r.siteName, positionLabel: r.positionLabel,
    task: r.task, opens: r.opens, closes: r.closes, state,
    assignedTo: r.assignedTo ? { userId: r.assignedTo, name: r.assigneeName ?? '' } : null, doneAt: r.doneAt?.toISOString() ?? null,
  };
}

// Jobs that closed up to this many days ago still show, so work done late can be ticked off.
const LATE_DAYS = 14;

export async function listJobs(groupId: string, userId: string, role: Role, now = new Date()): Promise<JobList> {
  const today = await groupToday(groupId, now);
  const mine = await sequelize.query<JobRow>(
    `SELECT ${jobColumns} ${jobFrom}
     WHERE cw.group_id = $1 AND cw.assigned_to = $2 AND cw.done_at IS NULL AND cw.closes >= $3::date
     ORDER BY cw.closes, cw.opens, s.name, p.position_label, cw.id`,
    { bind: [groupId, userId, addDays(today, -LATE_DAYS)], type: QueryTypes.SELECT },
  );
  const week = roleRank(role) >= roleRank('grower')
    ? await sequelize.query<JobRow>(
      `SELECT ${jobColumns} ${jobFrom}
       WHERE cw.group_id = $1 AND cw.done_at IS NULL AND cw.opens <= $2::date + 6 AND cw.closes >= $2::date
       ORDER BY cw.closes, cw.opens, s.name, p.position_label, cw.id`,
      { bind: [groupId, today], type: QueryTypes.SELECT },
    )
    : [];
  return { today, mine: mine.map((r) => toJob(r, now)), week: week.map((r) => toJob(r, now)) };
}

export interface WindowRow { id: string; plantId: string; siteId: string; task: string; opens: string; closes: string; timeZone: string; assignedTo: string | null; doneAt: Date | null }

/** A window of the group, locked for the rest of the transaction; 404 when it is another group's. */
export async function lockWindow(groupId: string, windowId: string, transaction: Transaction): Promise<WindowRow> {
  const [row] = await sequelize.query<WindowRow>(
    `SELECT cw.id, cw.plant_id AS "plantId", cw.site_id AS "siteId", cw.task, to_char(cw.opens, 'YYYY-MM-DD') AS opens, to_char(cw.closes, 'YYYY-MM-DD') AS closes,
       s.time_zone AS "timeZone", cw.assigned_to AS "assignedTo", cw.done_at AS "doneAt"
     FROM care_windows cw JOIN sites s ON s.id = cw.site_id WHERE cw.id = $1 AND cw.group_id = $2 FOR UPDATE OF cw`,
    { bind: [windowId, groupId], transaction, type: QueryTypes.SELECT },
  );
  if (!row) throw notFound('Job');
  return row;
}

async function assertCanTakeJobs(groupId: string, userId: string, transaction: Transaction): Promise<void> {
  const [member] = await sequelize.query<{ role: Role }>('SELECT role FROM memberships WHERE group_id = $1 AND user_id = $2', { bind: [groupId, userId], transaction, type: QueryTypes.SELECT });
  if (!member || member.role === 'viewer') throw validationFailed([{ path: 'userId', message: 'Choose someone in this group who can log work (a helper, grower or owner)' }]);
}

/** Hands a window to a person, or takes it back with null. Done and passed windows stay as they are. */
export async function assignJob(groupId: string, actorId: string, windowId: string, userId: string | null, now = new Date()): Promise<Job> {
  await sequelize.transaction(async (transaction) => {
    const window = await lockWindow(groupId, windowId, transaction);
    const today = todayIn(window.timeZone, now);
    if (window.doneAt) throw conflict('This job is already done');
    if (userId && window.closes < today) throw conflict('This window has passed; it can no longer be handed out');
    if (userId) await assertCanTakeJobs(groupId, userId, transaction);
    // The person it is taken from no longer hears about it in their next digest.
    await sequelize.query(`DELETE FROM reminder_deliveries WHERE window_id = $1 AND kind = 'assigned' AND digest_key IS NULL`, { bind: [windowId], transaction });
    await sequelize.query(
      'UPDATE care_windows SET assigned_to = $2, assigned_by = $3, assigned_at = $4, updated_at = now() WHERE id = $1',
      { bind: [windowId, userId, userId ? actorId : null, userId ? now : null], transaction },
    );
    if (userId && userId !== actorId) {
      await sequelize.query(
        `INSERT INTO reminder_deliveries (delivery_key, user_id, group_id, window_id, kind, pass_date)
         VALUES ($5, $1, $3, $2, 'assigned', $4::date) ON CONFLICT (delivery_key) DO NOTHING`,
        { bind: [userId, windowId, groupId, today, `assigned:${userId}:${windowId}:${today}`], transaction },
      );
    }
  });
  return jobById(groupId, windowId, now);
}

export async function jobById(groupId: string, windowId: string, now = new Date()): Promise<Job> {
  const [row] = await sequelize.query<JobRow>(`SELECT ${jobColumns} ${jobFrom} WHERE cw.id = $1 AND cw.group_id = $2`, { bind: [windowId, groupId], type: QueryTypes.SELECT });
  if (!row) throw notFound('Job');
  return toJob(row, now);
}
