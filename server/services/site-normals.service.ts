import { QueryTypes } from 'sequelize';
import type { z } from 'zod';
import { defaultNormals } from '../care';
import { sequelize } from '../db';
import { AppError } from '../lib/errors';
import { SiteNormal, type Site } from '../models';
import { roundTemperature, toCelsius } from '../schemas/readings';
import type { normalsUpdateSchema, SiteNormals } from '../schemas/weather';
import { siteInGroup } from './readings.service';

type NormalsUpdate = z.output<typeof normalsUpdateSchema>;

/** Days of readings a month needs, across all years, before its mean is trusted as a normal. */
export const MIN_DAYS_PER_MONTH = 15;
const MONTH_NAMES = ['January', 'February', 'March', 'April', 'May', 'June', 'July', 'August', 'September', 'October', 'November', 'December'];

/** The site's twelve months, or the engine's built-in year when it has no full set of its own. */
export async function normalsOf(site: Pick<Site, 'id' | 'latitude'>): Promise<SiteNormals> {
  const rows = await SiteNormal.findAll({ where: { siteId: site.id }, order: [['month', 'ASC']] });
  if (rows.length === 12) {
    return { source: rows.some((r) => r.source === 'manual') ? 'manual' : 'computed', months: rows.map((r) => ({ month: r.month, tminC: r.tminC, tmaxC: r.tmaxC })) };
  }
  return { source: 'built-in', months: defaultNormals(site.latitude).sort((a, b) => a.month - b.month).map((n) => ({ month: n.month, tminC: n.tmin, tmaxC: n.tmax })) };
}

async function replaceNormals(siteId: string, months: { month: number; tminC: number; tmaxC: number }[], source: 'manual' | 'computed'): Promise<void> {
  await sequelize.transaction(async (transaction) => {
    await SiteNormal.destroy({ where: { siteId }, transaction });
    await SiteNormal.bulkCreate(months.map((m) => ({ siteId, month: m.month, tminC: m.tminC, tmaxC: m.tmaxC, source })), { transaction });
  });
}

export async function getNormals(groupId: string, siteId: string): Promise<SiteNormals> {
  return normalsOf(await siteInGroup(groupId, siteId));
}

export async function saveNormals(groupId: string, siteId: string, body: NormalsUpdate): Promise<SiteNormals> {
  const site = await siteInGroup(groupId, siteId);
  const months = body.months.map((m) => ({ month: m.month, tminC: roundTemperature(toCelsius(m.tmin, body.unit)), tmaxC: roundTemperature(toCelsius(m.tmax, body.unit)) }));
  await replaceNormals(site.id, months, 'manual');
  return normalsOf(site);
}

/** Monthly means of every reading the site holds; refused while any month has too few days. */
export async function computeNormals(groupId: string, siteId: string): Promise<SiteNormals> {
  const site = await siteInGroup(groupId, siteId);
  const rows = await sequelize.query<{ month: number; tmin: number; tmax: number; days: string }>(
    `SELECT extract(month FROM date)::int AS month, avg(tmin_c) AS tmin, avg(tmax_c) AS tmax, count(*) AS days
     FROM site_readings WHERE site_id = :siteId GROUP BY 1 ORDER BY 1`,
    { replacements: { siteId }, type: QueryTypes.SELECT },
  );
  const byMonth = new Map(rows.map((r) => [r.month, r]));
  const short = MONTH_NAMES.flatMap((name, i) => {
    const days = Number(byMonth.get(i + 1)?.days ?? 0);
    return days < MIN_DAYS_PER_MONTH ? [`${name} (${days} day${days === 1 ? '' : 's'})`] : [];
  });
  if (short.length) {
    throw new AppError('UNPROCESSABLE', `Not enough readings to work out normals for ${short.join(', ')}; each month needs at least ${MIN_DAYS_PER_MONTH} days of readings.`);
  }
  const months = rows.map((r) => ({ month: r.month, tminC: Math.round(Number(r.tmin) * 10) / 10, tmaxC: Math.round(Number(r.tmax) * 10) / 10 }));
  await replaceNormals(site.id, months, 'computed');
  return normalsOf(site);
}

export async function clearNormals(groupId: string, siteId: string): Promise<SiteNormals> {
  const site = await siteInGroup(groupId, siteId);
  await SiteNormal.destroy({ where: { siteId: site.id } });
  return normalsOf(site);
}
