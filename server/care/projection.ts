import { addDays, daysBetween, fromUtcMs, hemisphereOf, isIsoDate, isLeapYear, makeDate, toUtcMs, type Hemisphere, type IsoDate } from './dates';
import { CareInputError, type DailyTemperature } from './degree-days';
import { FROM_MEMORY } from './sources';

// A season's daily temperatures: the readings a site has, and for every day without one, a value
// from the site's monthly climate normals (or, when it has none, a built-in temperate default).
// Degree-day triggers need a value for every day of the season to say when a stage is *expected*,
// and the windows must say whether that rests on measured days or on the projection.

export interface MonthlyNormal {
  month: number;
  tmin: number;
  tmax: number;
}

export type DaySource = 'reading' | 'projected';

export interface SeasonDay extends DailyTemperature {
  source: DaySource;
}

export type NormalsOrigin = 'site' | 'default';

/** One season at one site as parallel arrays: the form the degree-day accumulation wants. */
export interface SeasonTemperatures {
  season: number;
  hemisphere: Hemisphere;
  /** 1 January in the north, 1 July in the south. */
  start: IsoDate;
  /** The day before the next season starts. */
  end: IsoDate;
  length: number;
  tmin: Float64Array;
  tmax: Float64Array;
  /** 1 where the day is a reading, 0 where it was projected. */
  isReading: Uint8Array;
  readingCount: number;
  normalsOrigin: NormalsOrigin;
  /** How the projected days were filled, in words, for the windows' reasons. */
  normalsLabel: string;
}

// Approximate 1991–2020 monthly means for a lowland site in southern England, written down from
// memory (they are of the order the Met Office publishes for the Thames valley, not copied from a
// station). They stand in only when a site has neither readings nor normals for a day.
const LOWLAND_ENGLAND: readonly MonthlyNormal[] = [
  { month: 1, tmin: 1.5, tmax: 8.2 },
  { month: 2, tmin: 1.4, tmax: 8.9 },
  { month: 3, tmin: 2.9, tmax: 11.7 },
  { month: 4, tmin: 4.6, tmax: 15.0 },
  { month: 5, tmin: 7.6, tmax: 18.3 },
  { month: 6, tmin: 10.6, tmax: 21.3 },
  { month: 7, tmin: 12.7, tmax: 23.6 },
  { month: 8, tmin: 12.5, tmax: 23.1 },
  { month: 9, tmin: 10.2, tmax: 20.1 },
  { month: 10, tmin: 7.4, tmax: 15.9 },
  { month: 11, tmin: 4.0, tmax: 11.4 },
  { month: 12, tmin: 1.9, tmax: 8.7 },
];

export const TEMPERATE_DEFAULT_NORMALS: readonly MonthlyNormal[] = LOWLAND_ENGLAND;
export const TEMPERATE_DEFAULT_SOURCE = FROM_MEMORY;
export const TEMPERATE_DEFAULT_LABEL = 'built-in normals for lowland southern England';
const SITE_NORMALS_LABEL = "the site's monthly climate normals";

/** The default for a site: the lowland-England year, six months on in the southern hemisphere. */
export function defaultNormals(latitude: number): MonthlyNormal[] {
  if (hemisphereOf(latitude) === 'north') return LOWLAND_ENGLAND.map((n) => ({ ...n }));
  return LOWLAND_ENGLAND.map((n) => ({ ...n, month: ((n.month + 5) % 12) + 1 }));
}

export function seasonStart(season: number, hemisphere: Hemisphere): IsoDate {
  return hemisphere === 'north' ? makeDate(season, 1, 1) : makeDate(season, 7, 1);
}

export function seasonEnd(season: number, hemisphere: Hemisphere): IsoDate {
  return addDays(seasonStart(season + 1, hemisphere), -1);
}

function checkSeason(season: number): void {
  if (!Number.isInteger(season) || season < 1800 || season > 2200) {
    throw new CareInputError('The season must be a year such as 2025.', 'season');
  }
}

/** Twelve normals indexed by month − 1, after checking that each month appears exactly once. */
export function checkNormals(normals: readonly MonthlyNormal[]): MonthlyNormal[] {
  if (normals.length !== 12) throw new CareInputError('Give climate normals for all twelve months.', 'normals');
  const byMonth: (MonthlyNormal | undefined)[] = new Array<MonthlyNormal | undefined>(12).fill(undefined);
  normals.forEach((n, i) => {
    if (!Number.isInteger(n.month) || n.month < 1 || n.month > 12) throw new CareInputError('A month runs from 1 to 12.', `normals.${i}.month`);
    if (byMonth[n.month - 1]) throw new CareInputError(`Month ${n.month} appears twice.`, `normals.${i}.month`);
    if (!Number.isFinite(n.tmin) || !Number.isFinite(n.tmax)) throw new CareInputError('Normals must be numbers.', `normals.${i}.tmin`);
    if (n.tmin > n.tmax) throw new CareInputError(`The mean minimum (${n.tmin}) is above the mean maximum (${n.tmax}).`, `normals.${i}.tmin`);
    byMonth[n.month - 1] = n;
  });
  return byMonth as MonthlyNormal[];
}

// Midpoints of the months of one calendar year as day offsets from 1 January, with December of the
// year before and January of the year after on either side, so every day has a pair to sit between.
const midpointCache = new Map<number, number[]>();

function monthMidpoints(year: number): number[] {
  const cached = midpointCache.get(year);
  if (cached) return cached;
  const mids: number[] = [];
  for (let m = 0; m <= 13; m++) {
    const first = daysBetween(makeDate(year, 1, 1), makeDate(year, m, 1));
    const length = daysBetween(makeDate(year, m, 1), makeDate(year, m + 1, 1));
    mids.push(first + (length - 1) / 2);
  }
  midpointCache.set(year, mids);
  return mids;
}

function fillCalendarYear(year: number, normals: readonly MonthlyNormal[], into: { tmin: number[]; tmax: number[] }): void {
  const mids = monthMidpoints(year);
  const days = isLeapYear(year) ? 366 : 365;
  let k = 0;
  for (let t = 0; t < days; t++) {
    while ((mids[k + 1] as number) <= t) k++;
    const lo = mids[k] as number;
    const weight = (t - lo) / ((mids[k + 1] as number) - lo);
    const a = normals[(k + 11) % 12] as MonthlyNormal; // mids[0] is last December
    const b = normals[k % 12] as MonthlyNormal;
    into.tmin.push(a.tmin + (b.tmin - a.tmin) * weight);
    into.tmax.push(a.tmax + (b.tmax - a.tmax) * weight);
  }
}

/**
 * Daily values from monthly normals for `from` … `to` (both included). Each month's normal sits at
 * its middle day and the days between two middles are interpolated in a straight line, so the
 * curve has no steps at month boundaries.
 */
export function dailyNormals(from: IsoDate, to: IsoDate, normals: readonly MonthlyNormal[]): { tmin: number[]; tmax: number[] } {
  const table = checkNormals(normals);
  const year0 = Number(from.slice(0, 4));
  const year1 = Number(to.slice(0, 4));
  const all = { tmin: [] as number[], tmax: [] as number[] };
  for (let y = year0; y <= year1; y++) fillCalendarYear(y, table, all);
  const skip = daysBetween(makeDate(year0, 1, 1), from);
  const count = daysBetween(from, to) + 1;
  return { tmin: all.tmin.slice(skip, skip + count), tmax: all.tmax.slice(skip, skip + count) };
}

// The season's dates as strings, shared between sites: comparing a reading's date with the
// expected string is far cheaper than parsing it, and readings usually arrive in order.
const seasonDateCache = new Map<string, IsoDate[]>();

function datesFrom(start: IsoDate, length: number): IsoDate[] {
  const key = `${start}:${length}`;
  let dates = seasonDateCache.get(key);
  if (!dates) {
    const startMs = toUtcMs(start);
    dates = Array.from({ length }, (_, i) => fromUtcMs(startMs + i * 86_400_000));
    seasonDateCache.set(key, dates);
  }
  return dates;
}

const frameCache = new Map<string, { start: IsoDate; end: IsoDate; dates: IsoDate[] }>();

function seasonFrame(season: number, hemisphere: Hemisphere): { start: IsoDate; end: IsoDate; dates: IsoDate[] } {
  const key = `${season}:${hemisphere}`;
  let frame = frameCache.get(key);
  if (!frame) {
    const start = seasonStart(season, hemisphere);
    const end = seasonEnd(season, hemisphere);
    frame = { start, end, dates: datesFrom(start, daysBetween(start, end) + 1) };
    frameCache.set(key, frame);
  }
  return frame;
}

function checkReading(r: DailyTemperature, i: number): void {
  if (!Number.isFinite(r.tmin)) throw new CareInputError('The minimum temperature must be a number.', `readings.${i}.tmin`);
  if (!Number.isFinite(r.tmax)) throw new CareInputError('The maximum temperature must be a number.', `readings.${i}.tmax`);
  if (r.tmin > r.tmax) throw new CareInputError(`The minimum temperature (${r.tmin}) is above the maximum (${r.tmax}).`, `readings.${i}.tmin`);
}

function placeReadings(readings: readonly DailyTemperature[], dates: IsoDate[], start: IsoDate, out: SeasonTemperatures): void {
  const length = dates.length;
  let guess = 0;
  // A plain loop: this runs for every reading of every site, and readings usually come in date
  // order, so the expected date is tried before any parsing.
  for (let i = 0; i < readings.length; i++) {
    const r = readings[i] as DailyTemperature;
    checkReading(r, i);
    const isExpected = dates[guess] === r.date;
    if (!isExpected && !isIsoDate(r.date)) throw new CareInputError('Use the form YYYY-MM-DD for dates.', `readings.${i}.date`);
    const index = isExpected ? guess : daysBetween(start, r.date);
    guess = index + 1;
    if (index < 0 || index >= length) continue; // another season's reading: not ours to use
    if (out.isReading[index] === 0) out.readingCount++;
    out.tmin[index] = r.tmin;
    out.tmax[index] = r.tmax;
    out.isReading[index] = 1;
  }
}

function toArrays(days: { tmin: number[]; tmax: number[] }): { tmin: Float64Array; tmax: Float64Array } {
  return { tmin: Float64Array.from(days.tmin), tmax: Float64Array.from(days.tmax) };
}

// Most sites have no normals of their own, and the default season is the same for all of them in a
// hemisphere: fill it once and copy it.
const defaultSeasonCache = new Map<string, { tmin: Float64Array; tmax: Float64Array }>();

function defaultSeason(start: IsoDate, end: IsoDate, latitude: number): { tmin: Float64Array; tmax: Float64Array } {
  const key = `${start}:${end}`;
  let season = defaultSeasonCache.get(key);
  if (!season) {
    season = toArrays(dailyNormals(start, end, defaultNormals(latitude)));
    defaultSeasonCache.set(key, season);
  }
  return season;
}

export interface ProjectionInput {
  season: number;
  latitude: number;
  readings?: readonly DailyTemperature[];
  normals?: readonly MonthlyNormal[];
}

/** A full season of daily temperatures: readings where given (a later duplicate wins), normals elsewhere. */
export function projectSeason(input: ProjectionInput): SeasonTemperatures {
  checkSeason(input.season);
  if (!Number.isFinite(input.latitude) || Math.abs(input.latitude) > 90) throw new CareInputError('Latitude runs from -90 to 90.', 'latitude');
  const hemisphere = hemisphereOf(input.latitude);
  const { start, end, dates } = seasonFrame(input.season, hemisphere);
  const hasSiteNormals = input.normals !== undefined && input.normals.length > 0;
  const filled = hasSiteNormals ? toArrays(dailyNormals(start, end, input.normals as readonly MonthlyNormal[])) : defaultSeason(start, end, input.latitude);
  const out: SeasonTemperatures = {
    season: input.season,
    hemisphere,
    start,
    end,
    length: dates.length,
    tmin: filled.tmin.slice(),
    tmax: filled.tmax.slice(),
    isReading: new Uint8Array(dates.length),
    readingCount: 0,
    normalsOrigin: hasSiteNormals ? 'site' : 'default',
    normalsLabel: hasSiteNormals ? SITE_NORMALS_LABEL : hemisphere === 'north' ? TEMPERATE_DEFAULT_LABEL : `${TEMPERATE_DEFAULT_LABEL}, moved six months for the southern hemisphere`,
  };
  if (input.readings) placeReadings(input.readings, dates, start, out);
  return out;
}

/** The season's dates in order, one per day (shared: do not change the array). */
export function seasonDateList(series: SeasonTemperatures): readonly IsoDate[] {
  return datesFrom(series.start, series.length);
}

/** The season day by day, saying for each whether it was read or projected. */
export function seasonDays(series: SeasonTemperatures): SeasonDay[] {
  return datesFrom(series.start, series.length).map((date, i) => ({
    date,
    tmin: series.tmin[i] as number,
    tmax: series.tmax[i] as number,
    source: series.isReading[i] === 1 ? 'reading' : 'projected',
  }));
}

/** Convenience: readings and normals in, the day-by-day season out. */
export function projectSeasonDays(input: ProjectionInput): SeasonDay[] {
  return seasonDays(projectSeason(input));
}
