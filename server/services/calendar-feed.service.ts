import { createEvents, type DateArray, type EventAttributes } from 'ics';
import { QueryTypes } from 'sequelize';
import { config } from '../config';
import { sequelize } from '../db';
import { AppError, notFound } from '../lib/errors';
import { sha256Hex } from '../lib/signed-tokens';
import { ReminderPreference } from '../models';
import { plantTypeLabels, type PlantTypeCode } from '../schemas/catalogue';
import { reminderTaskLabels, type ReminderTaskCode } from '../schemas/reminders';

// A person's secret iCalendar feed (RFC 5545): every care window of their groups' plants as an
// all-day event, from a month back to a year ahead, for a phone calendar to subscribe to.

interface FeedRow {
  id: string; task: string; opens: string; closes: string; reason: string; done: boolean; updated_at: Date;
  plant_id: string; type_code: string; cultivar: string; position_label: string; site_name: string; group_name: string;
}

const MAX_EVENTS = 5_000;
const TOKEN = /^[A-Za-z0-9_-]{43}$/;

const toDateArray = (date: string): DateArray => date.split('-').map(Number) as [number, number, number];
// All-day events end on the day after the last one (RFC 5545 §3.6.1: DTEND is not included).
const dayAfter = (date: string): DateArray => {
  const d = new Date(`${date}T00:00:00Z`);
  d.setUTCDate(d.getUTCDate() + 1);
  return [d.getUTCFullYear(), d.getUTCMonth() + 1, d.getUTCDate()];
};

function toEvent(row: FeedRow): EventAttributes {
  const type = plantTypeLabels[row.type_code as PlantTypeCode] ?? row.type_code;
  const plant = row.cultivar ? `'${row.cultivar}' ${type.toLowerCase()}` : type;
  const task = reminderTaskLabels[row.task as ReminderTaskCode] ?? row.task;
  const url = `${config.APP_URL}/plants/${row.plant_id}`;
  return {
    uid: `${row.id}@spurwood`,
    start: toDateArray(row.opens),
    end: dayAfter(row.closes),
    title: `${row.done ? 'Done: ' : ''}${task}: ${plant}`,
    location: `${row.site_name}${row.position_label ? `, ${row.position_label}` : ''} (${row.group_name})`,
    description: `${row.reason}\n\nCautions and ladder set-up come with the reminder e-mails. ${url}`,
    url,
    transp: 'TRANSPARENT',
    lastModified: row.updated_at.getTime(),
  };
}

/** The feed for a token; 404 for any token that is not a person's current one. */
export async function calendarFeed(token: string): Promise<string> {
  const pref = TOKEN.test(token) ? await ReminderPreference.findOne({ where: { calendarTokenHash: sha256Hex(token) }, attributes: ['userId'] }) : null;
  if (!pref) throw notFound('Calendar');
  const rows = await sequelize.query<FeedRow>(
    `SELECT cw.id, cw.task, to_char(cw.opens, 'YYYY-MM-DD') AS opens, to_char(cw.closes, 'YYYY-MM-DD') AS closes, wd.reason,
       cw.done_at IS NOT NULL AS done, cw.updated_at, p.id AS plant_id, p.type_code, p.cultivar, p.position_label, s.name AS site_name, g.name AS group_name
     FROM care_windows cw
     JOIN care_window_wordings wd ON wd.id = cw.wording_id
     JOIN memberships m ON m.group_id = cw.group_id AND m.user_id = $1
     JOIN plants p ON p.id = cw.plant_id AND p.archived_at IS NULL
     JOIN sites s ON s.id = cw.site_id AND s.archived_at IS NULL
     JOIN groups g ON g.id = cw.group_id
     WHERE cw.closes >= current_date - 31 AND cw.opens <= current_date + 400
     ORDER BY cw.opens, s.name, p.position_label LIMIT $2`,
    { bind: [pref.userId, MAX_EVENTS], type: QueryTypes.SELECT },
  );
  const { error, value } = createEvents(rows.map(toEvent), { productId: '-//Spurwood//Care windows//EN', method: 'PUBLISH', calName: 'Spurwood jobs' });
  if (error || value === null) throw new AppError('INTERNAL', 'The calendar could not be built');
  return value;
}
