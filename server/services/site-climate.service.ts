import { QueryTypes } from 'sequelize';
import { hemisphereOf } from '../care/dates';
import type { DailyTemperature } from '../care/degree-days';
import type { MonthlyNormal } from '../care/projection';
import { seasonEnd, seasonStart } from '../care/projection';
import { sequelize } from '../db';

export interface SiteClimate {
  /** Daily readings (°C) within the season, oldest first. */
  readings: DailyTemperature[];
  /** The site's monthly normals (°C); empty when it has none, and the engine's default stands in. */
  normals: MonthlyNormal[];
  /** The newest reading within the season, if any. */
  latestReading: string | null;
}

/**
 * What the care engine needs to know about a site's weather for one season, for many sites in two
 * queries: the worker's daily pass, the plant page and the calendar all read it through here.
 */
export async function loadSiteClimates(sites: { id: string; latitude: number }[], season: number): Promise<Map<string, SiteClimate>> {
  const out = new Map<string, SiteClimate>(sites.map((s) => [s.id, { readings: [], normals: [], latestReading: null }]));
  if (!sites.length) return out;
  // North and south seasons cover different dates, so ask for the span of both and trim per site.
  const from = seasonStart(season, 'north') < seasonStart(season, 'south') ? seasonStart(season, 'north') : seasonStart(season, 'south');
  const to = seasonEnd(season, 'north') > seasonEnd(season, 'south') ? seasonEnd(season, 'north') : seasonEnd(season, 'south');
  const ids = sites.map((s) => s.id);
  // One JSON array of [date, tmin, tmax] per site: the daily pass reads a season for thousands of
  // sites, and one parsed document per site costs the worker a third of what a row per day did.
  const readings = await sequelize.query<{ site_id: string; days: [string, number, number][] }>(
    `SELECT site_id, json_agg(json_build_array(date, tmin_c, tmax_c) ORDER BY date) AS days FROM site_readings
     WHERE site_id IN (:ids) AND date BETWEEN :from AND :to GROUP BY site_id`,
    { replacements: { ids, from, to }, type: QueryTypes.SELECT },
  );
  const normals = await sequelize.query<{ site_id: string; month: number; tmin_c: number; tmax_c: number }>(
    'SELECT site_id, month, tmin_c, tmax_c FROM site_normals WHERE site_id IN (:ids) ORDER BY site_id, month',
    { replacements: { ids }, type: QueryTypes.SELECT },
  );
  const span = new Map(sites.map((s) => [s.id, [seasonStart(season, hemisphereOf(s.latitude)), seasonEnd(season, hemisphereOf(s.latitude))] as const]));
  for (const { site_id: siteId, days } of readings) {
    const [start, end] = span.get(siteId)!;
    const climate = out.get(siteId)!;
    for (const [date, tmin, tmax] of days) {
      if (date < start || date > end) continue;
      climate.readings.push({ date, tmin, tmax });
      climate.latestReading = date;
    }
  }
  for (const n of normals) out.get(n.site_id)!.normals.push({ month: n.month, tmin: n.tmin_c, tmax: n.tmax_c });
  // A partial set of normals cannot stand in for a season; leave the engine's default to do it.
  for (const climate of out.values()) if (climate.normals.length !== 12) climate.normals = [];
  return out;
}

export async function loadSiteClimate(site: { id: string; latitude: number }, season: number): Promise<SiteClimate> {
  return (await loadSiteClimates([site], season)).get(site.id)!;
}
