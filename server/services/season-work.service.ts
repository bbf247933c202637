import { QueryTypes } from 'sequelize';
import { hemisphereOf, yearOf } from '../care';
import { sequelize } from '../db';
import { Site } from '../models';
import type { SeasonWork } from '../schemas/team';
import { groupToday, plantTitle } from './group-today';

// "Who has done what this season", for owners: counts by person and kind from the work log, and the
// latest entries. A season is the calendar year in the north and July to June in the south, as the
// care windows count it; the group's first site decides which.

const LIST_LIMIT = 200;

async function seasonBounds(groupId: string, season: number | undefined): Promise<{ season: number; from: string; to: string }> {
  const site = await Site.findOne({ where: { groupId }, attributes: ['latitude'], order: [['createdAt', 'ASC']] });
  const isSouth = site ? hemisphereOf(site.latitude) === 'south' : false;
  const today = await groupToday(groupId);
  const current = isSouth && Number(today.slice(5, 7)) < 7 ? yearOf(today) - 1 : yearOf(today);
  const year = season ?? current;
  return isSouth ? { season: year, from: `${year}-07-01`, to: `${year + 1}-06-30` } : { season: year, from: `${year}-01-01`, to: `${year}-12-31` };
}

export async function seasonWork(groupId: string, seasonAsked: number | undefined): Promise<SeasonWork> {
  const { season, from, to } = await seasonBounds(groupId, seasonAsked);
  const counts = await sequelize.query<{ userId: string | null; name: string | null; kind: string; n: string }>(
    `SELECT le.done_by AS "userId", u.name, le.kind, count(*) AS n FROM log_entries le LEFT JOIN users u ON u.id = le.done_by
     WHERE le.group_id = $1 AND le.done_on BETWEEN $2::date AND $3::date GROUP BY le.done_by, u.name, le.kind`,
    { bind: [groupId, from, to], type: QueryTypes.SELECT },
  );
  const people = new Map<string, SeasonWork['people'][number]>();
  for (const c of counts) {
    const key = c.userId ?? 'gone';
    const person = people.get(key) ?? { userId: c.userId, name: c.name ?? 'A former member', total: 0, byKind: {} };
    person.byKind[c.kind] = Number(c.n);
    person.total += Number(c.n);
    people.set(key, person);
  }
  const entries = await sequelize.query<{ id: string; date: string; kind: string; name: string | null; plants: { cultivar: string; typeCode: string }[] }>(
    `SELECT le.id, to_char(le.done_on, 'YYYY-MM-DD') AS date, le.kind, u.name,
       coalesce(json_agg(json_build_object('cultivar', p.cultivar, 'typeCode', p.type_code) ORDER BY p.position_label) FILTER (WHERE p.id IS NOT NULL), '[]') AS plants
     FROM log_entries le LEFT JOIN users u ON u.id = le.done_by
     LEFT JOIN log_entry_plants lep ON lep.log_entry_id = le.id LEFT JOIN plants p ON p.id = lep.plant_id
     WHERE le.group_id = $1 AND le.done_on BETWEEN $2::date AND $3::date
     GROUP BY le.id, u.name ORDER BY le.done_on DESC, le.created_at DESC LIMIT ${LIST_LIMIT}`,
    { bind: [groupId, from, to], type: QueryTypes.SELECT },
  );
  return {
    season,
    people: [...people.values()].sort((a, b) => b.total - a.total || a.name.localeCompare(b.name)),
    entries: entries.map((e) => ({ id: e.id, date: e.date, kind: e.kind, personName: e.name ?? 'A former member', plantNames: e.plants.map(plantTitle) })),
  };
}
