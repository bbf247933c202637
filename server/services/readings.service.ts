import { Op, QueryTypes, type Transaction } from 'sequelize';
import type { z } from 'zod';
import { addDays, todayIn } from '../care';
import { sequelize } from '../db';
import { AppError, conflict, notFound } from '../lib/errors';
import { Site, SiteReading } from '../models';
import {
  roundTemperature, toCelsius,
  type OnExisting, type Reading, type ReadingList, type readingCreateSchema, type readingListQuerySchema, type ReadingSource, type readingUpdateSchema,
} from '../schemas/readings';

type ListQuery = z.output<typeof readingListQuerySchema>;
type DayInput = z.output<typeof readingUpdateSchema>;
type DayCreate = z.output<typeof readingCreateSchema>;

/** A day ready to store, in °C. */
export interface DayRow { date: string; tminC: number; tmaxC: number; rainMm: number | null }

/** The site, if it belongs to the caller's group: every weather call starts here. */
export async function siteInGroup(groupId: string, siteId: string): Promise<Site> {
  const site = await Site.findOne({ where: { id: siteId, groupId } });
  if (!site) throw notFound('Site');
  return site;
}

export function toReading(r: SiteReading): Reading {
  return { date: r.date, tminC: r.tminC, tmaxC: r.tmaxC, rainMm: r.rainMm, source: r.source };
}

export async function latestReadingOf(siteId: string, transaction?: Transaction): Promise<string | null> {
  const row = await SiteReading.findOne({ where: { siteId }, attributes: ['date'], order: [['date', 'DESC']], transaction });
  return row?.date ?? null;
}

// A year back from today at the site unless the query says otherwise: the table shows one season at a time.
export async function listReadings(groupId: string, siteId: string, query: ListQuery): Promise<ReadingList> {
  const site = await siteInGroup(groupId, siteId);
  const to = query.to ?? todayIn(site.timeZone);
  const from = query.from ?? addDays(to, -365);
  if (Date.parse(to) - Date.parse(from) > 11 * 366 * 86_400_000) throw new AppError('VALIDATION_FAILED', 'Ask for at most ten years at a time', [{ path: 'query.from', message: 'Ask for at most ten years at a time' }]);
  const rows = await SiteReading.findAll({ where: { siteId, date: { [Op.between]: [from, to] } }, order: [['date', 'ASC']] });
  return { items: rows.map(toReading), latestReading: await latestReadingOf(siteId) };
}

function dayRow(date: string, input: DayInput): DayRow {
  return {
    date,
    tminC: roundTemperature(toCelsius(input.tmin, input.unit)),
    tmaxC: roundTemperature(toCelsius(input.tmax, input.unit)),
    rainMm: input.rainMm ?? null,
  };
}

function refuseFuture(date: string, timeZone: string): void {
  if (date > todayIn(timeZone)) throw new AppError('VALIDATION_FAILED', 'A reading cannot be for a day that has not happened yet', [{ path: 'date', message: 'This day is after today at the site' }]);
}

export async function createReading(groupId: string, siteId: string, input: DayCreate): Promise<Reading> {
  const site = await siteInGroup(groupId, siteId);
  refuseFuture(input.date, site.timeZone);
  if (await SiteReading.findOne({ where: { siteId, date: input.date } })) {
    throw conflict(`${input.date} already has a reading; edit that day instead`, [{ path: 'date', message: 'This day already has a reading' }]);
  }
  const row = await SiteReading.create({ ...dayRow(input.date, input), siteId, source: 'manual' });
  return toReading(row);
}

export async function updateReading(groupId: string, siteId: string, date: string, input: DayInput): Promise<Reading> {
  await siteInGroup(groupId, siteId);
  const row = await SiteReading.findOne({ where: { siteId, date } });
  if (!row) throw notFound('Reading');
  // A corrected day is the grower's word now, whatever first brought it in.
  const { tminC, tmaxC, rainMm } = dayRow(date, input);
  await row.update({ tminC, tmaxC, rainMm, source: 'manual' });
  return toReading(row);
}

export async function deleteReading(groupId: string, siteId: string, date: string): Promise<void> {
  await siteInGroup(groupId, siteId);
  const removed = await SiteReading.destroy({ where: { siteId, date } });
  if (!removed) throw notFound('Reading');
}

/**
 * Many days in one statement (arrays unnested server-side), so a ten-year file is one round trip.
 * The caller's transaction makes it all or nothing. Returns how many rows were added and replaced.
 */
export async function writeDays(siteId: string, days: DayRow[], source: ReadingSource, onExisting: OnExisting, transaction: Transaction): Promise<{ added: number; replaced: number }> {
  if (days.length === 0) return { added: 0, replaced: 0 };
  const onConflict = onExisting === 'replace'
    ? 'DO UPDATE SET tmin_c = EXCLUDED.tmin_c, tmax_c = EXCLUDED.tmax_c, rain_mm = EXCLUDED.rain_mm, source = EXCLUDED.source, updated_at = now()'
    : 'DO NOTHING';
  const rows = await sequelize.query<{ inserted: boolean }>(
    `INSERT INTO site_readings (site_id, date, tmin_c, tmax_c, rain_mm, source)
     SELECT $1::uuid, d, mn, mx, r, $6 FROM unnest($2::date[], $3::real[], $4::real[], $5::real[]) AS t(d, mn, mx, r)
     ON CONFLICT (site_id, date) ${onConflict}
     RETURNING (xmax = 0) AS inserted`,
    {
      bind: [siteId, days.map((d) => d.date), days.map((d) => d.tminC), days.map((d) => d.tmaxC), days.map((d) => d.rainMm), source],
      type: QueryTypes.SELECT,
      transaction,
    },
  );
  const added = rows.filter((r) => r.inserted).length;
  return { added, replaced: rows.length - added };
}

/** The days from `from` to `to` (both included) the site already holds. */
export async function storedDates(siteId: string, from: string, to: string): Promise<Set<string>> {
  const rows = await SiteReading.findAll({ where: { siteId, date: { [Op.between]: [from, to] } }, attributes: ['date'], raw: true });
  return new Set(rows.map((r) => r.date));
}
