import { daysBetween, hemisphereOf, isIsoDate, type Hemisphere, type IsoDate } from '../dates';
import type { DailyTemperature } from '../degree-days';
import { CareInputError } from '../errors';
import { dailyNormals, defaultNormals, TEMPERATE_DEFAULT_LABEL, type MonthlyNormal } from './normals';
import { checkSeason, datesFrom, seasonFrame } from './season-dates';

// A season's daily temperatures: the readings a site has, and for every day without one, a value
// from the site's monthly climate normals (or, when it has none, a built-in temperate default).
// Degree-day triggers need a value for every day of the season to say when a stage is *expected*,
// and the windows must say whether that rests on measured days or on the projection.

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

const SITE_NORMALS_LABEL = "the site's monthly climate normals";

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
