import { Op } from 'sequelize';
import type { z } from 'zod';
import {
  addDays, chillHours, cumulativeDegreeDays, dailyNormals, dateRange, hemisphereOf, hourlyTemperatures, makeDate, monthOf, siteSeason, todayIn, utahChillUnits, yearOf,
  type DailyTemperature, type MonthlyNormal,
} from '../care';
import { SiteReading, type Site } from '../models';
import type { SiteWeather, weatherQuerySchema } from '../schemas/weather';
import { seasonContaining } from './plant-windows.service';
import { latestReadingOf, siteInGroup } from './readings.service';
import { loadSiteClimate } from './site-climate.service';
import { normalsOf } from './site-normals.service';

type WeatherQuery = z.output<typeof weatherQuerySchema>;

const oneDecimal = (values: ArrayLike<number>) => Array.from(values, (v) => Math.round(v * 10) / 10);
const minDate = (a: string, b: string) => (a < b ? a : b);

/** Runs of days without a reading, as date ranges, between `from` and `through`. */
function missingRanges(dates: readonly string[], isReading: ArrayLike<number>, through: string): { count: number; ranges: { from: string; to: string }[] } {
  const ranges: { from: string; to: string }[] = [];
  let count = 0;
  dates.forEach((date, i) => {
    if (date > through || isReading[i] === 1) return;
    count++;
    const last = ranges[ranges.length - 1];
    if (last && addDays(last.to, 1) === date) last.to = date;
    else ranges.push({ from: date, to: date });
  });
  return { count, ranges };
}

/**
 * The winter whose chill matters now: counted from 1 October to the end of February (1 April to the
 * end of August in the south), the UK convention of counting chill from 1 October
 * (care-rules.md §7.5, S66/S67). The latest winter that has begun by `on`.
 */
export function chillWinter(on: string, latitude: number): { from: string; to: string } {
  const startMonth = hemisphereOf(latitude) === 'north' ? 10 : 4;
  const year = monthOf(on) >= startMonth ? yearOf(on) : yearOf(on) - 1;
  const from = makeDate(year, startMonth, 1);
  return { from, to: addDays(makeDate(year + (startMonth === 10 ? 1 : 0), startMonth === 10 ? 3 : 9, 1), -1) };
}

/** The winter begun by `on`, counted to its end or to `lastDay` (yesterday), whichever is earlier. */
async function winterChill(site: Site, on: string, lastDay: string, normals: MonthlyNormal[]): Promise<SiteWeather['chill']> {
  const { from, to } = chillWinter(on, site.latitude);
  const through = minDate(lastDay, to);
  const empty = { from, to, through: null, chillHours: 0, utahUnits: 0, dailyHours: [], dailyUtah: [], missingDays: 0 };
  if (through < from) return empty;
  const rows = await SiteReading.findAll({ where: { siteId: site.id, date: { [Op.between]: [from, through] } }, attributes: ['date', 'tminC', 'tmaxC'], raw: true });
  const byDate = new Map(rows.map((r) => [r.date, r]));
  const fill = dailyNormals(from, through, normals);
  // Missing days borrow the normals so one gap does not read as a warm spell with no chill at all.
  const days: DailyTemperature[] = dateRange(from, through).map((date, i) => {
    const r = byDate.get(date);
    return r ? { date, tmin: r.tminC, tmax: r.tmaxC } : { date, tmin: fill.tmin[i] as number, tmax: fill.tmax[i] as number };
  });
  const hourly = hourlyTemperatures(days, site.latitude).map((h) => h.temp);
  const dailyHours: number[] = [];
  const dailyUtah: number[] = [];
  let hoursTotal = 0;
  let utahTotal = 0;
  for (let d = 0; d < days.length; d++) {
    const dayHours = hourly.slice(d * 24, d * 24 + 24);
    hoursTotal += chillHours(dayHours);
    utahTotal += utahChillUnits(dayHours);
    dailyHours.push(hoursTotal);
    dailyUtah.push(Math.round(utahTotal * 10) / 10);
  }
  return { from, to, through, chillHours: hoursTotal, utahUnits: Math.round(utahTotal * 10) / 10, dailyHours, dailyUtah, missingDays: days.length - byDate.size };
}

export async function siteWeather(groupId: string, siteId: string, query: WeatherQuery): Promise<SiteWeather> {
  const site = await siteInGroup(groupId, siteId);
  const today = todayIn(site.timeZone);
  const season = query.season ?? seasonContaining(today, site.latitude);
  const [climate, normals, latestReading] = await Promise.all([loadSiteClimate(site, season), normalsOf(site), latestReadingOf(site.id)]);
  const engineNormals = normals.months.map((m) => ({ month: m.month, tmin: m.tminC, tmax: m.tmaxC }));
  // The built-in year goes in as "no normals", so the engine names it as its own default.
  const siteNormals = normals.source === 'built-in' ? undefined : engineNormals;
  const actual = siteSeason(site, season, climate.readings, siteNormals);
  const usual = siteSeason(site, season, [], siteNormals);
  const temps = actual.temperatures;
  // Today's minimum and maximum are not known until the day is over: yesterday is the last day a reading can be missing.
  const through = minDate(addDays(today, -1), temps.end);
  const dates = dateRange(temps.start, temps.end);
  return {
    season, today, start: temps.start, end: temps.end, base: query.base, latestReading, stationId: site.stationId ?? null, normals,
    degreeDays: {
      season: oneDecimal(cumulativeDegreeDays(actual, query.base)),
      normal: oneDecimal(cumulativeDegreeDays(usual, query.base)),
      isReading: Array.from(temps.isReading),
      through,
    },
    missing: missingRanges(dates, temps.isReading, through),
    readingDays: temps.readingCount,
    chill: await winterChill(site, through, addDays(today, -1), engineNormals),
  };
}
