import { monthOf, type Hemisphere, type IsoDate } from './dates';

// Degree-days from daily extremes. Every formula is unit-agnostic: temperatures and thresholds
// only have to share a unit, so callers convert and this file never guesses.
//
// The triangle and sine methods are written with one building block, A(T) = the daily mean of
// max(T(t) − T, 0), as in the UC IPM definitions reproduced in Zalom et al. 1983 (UC DANR Leaflet
// 21373): horizontal = A(TL) − A(TU). "Intermediate" is ambiguous in the literature; we use the
// UC IPM definition (subtract the area above TU once more, capped at the vertical strip) so that
// results match the UC IPM calculator and the published phenology models built on it.

export type DegreeDayMethod = 'average' | 'single-triangle' | 'double-triangle' | 'single-sine' | 'double-sine';
export type Cutoff = 'horizontal' | 'intermediate' | 'vertical';
export type TemperatureUnit = 'C' | 'F';

export interface DailyTemperature {
  date: IsoDate;
  tmin: number;
  tmax: number;
}

export interface DegreeDayOptions {
  method: DegreeDayMethod;
  /** Defaults to horizontal. Ignored by the average method, which only caps at `upper`. */
  cutoff?: Cutoff;
  lower: number;
  /** Leave out for no upper threshold (no cutoff). */
  upper?: number;
}

/** Bad input the caller should have caught; the HTTP layer answers it with a 400 and `path`. */
export class CareInputError extends Error {
  readonly path: string;

  constructor(message: string, path: string) {
    super(message);
    this.name = 'CareInputError';
    this.path = path;
  }
}

const HALF_PI = Math.PI / 2;

// Flat numbers instead of an options object so the per-day loop does no property lookups by string.
const enum Shape {
  Average,
  Triangle,
  Sine,
}
const enum CutoffCode {
  Horizontal,
  Intermediate,
  Vertical,
}

interface Prepared {
  shape: Shape;
  isDouble: boolean;
  cutoff: CutoffCode;
  lower: number;
  upper: number; // +Infinity when there is none
}

function prepare(options: DegreeDayOptions): Prepared {
  const { method, lower, upper } = options;
  if (!Number.isFinite(lower)) throw new CareInputError('The lower threshold must be a number.', 'lower');
  if (upper !== undefined) {
    if (!Number.isFinite(upper)) throw new CareInputError('The upper threshold must be a number.', 'upper');
    if (upper <= lower) throw new CareInputError('The upper threshold must be above the lower threshold.', 'upper');
  }
  const shape = method === 'average' ? Shape.Average : method.endsWith('sine') ? Shape.Sine : Shape.Triangle;
  const cutoff = options.cutoff === 'vertical' ? CutoffCode.Vertical : options.cutoff === 'intermediate' ? CutoffCode.Intermediate : CutoffCode.Horizontal;
  return { shape, isDouble: method.startsWith('double'), cutoff, lower, upper: upper ?? Number.POSITIVE_INFINITY };
}

// The path is built only on failure: the check runs once per day in the hot loop.
function checkDay(tmin: number, tmax: number, index: number | null): void {
  if (Number.isFinite(tmin) && Number.isFinite(tmax) && tmin <= tmax) return;
  const prefix = index === null ? '' : `days.${index}.`;
  if (!Number.isFinite(tmin)) throw new CareInputError('The minimum temperature must be a number.', `${prefix}tmin`);
  if (!Number.isFinite(tmax)) throw new CareInputError('The maximum temperature must be a number.', `${prefix}tmax`);
  throw new CareInputError(`The minimum temperature (${tmin}) is above the maximum (${tmax}).`, `${prefix}tmin`);
}

// areaAbove also leaves the share of the day spent above t here, because the vertical and
// intermediate cutoffs need both at the upper threshold and they share one asin. A module
// variable instead of a returned object keeps the per-day loop free of allocation.
let fractionAboveLast = 0;

/** Daily mean of max(T(t) − t, 0) for a curve running between lo and hi. */
function areaAbove(shape: Shape, lo: number, hi: number, t: number): number {
  if (hi <= t) {
    fractionAboveLast = 0;
    return 0;
  }
  const mean = (hi + lo) / 2;
  if (lo >= t) {
    fractionAboveLast = 1;
    return mean - t;
  }
  if (shape === Shape.Sine) {
    const amp = (hi - lo) / 2;
    let x = (t - mean) / amp;
    x = x < -1 ? -1 : x > 1 ? 1 : x; // floating point can push it a hair past ±1
    const theta = Math.asin(x);
    fractionAboveLast = (HALF_PI - theta) / Math.PI;
    // cos(asin x) = √(1 − x²), which saves a cos per threshold.
    return ((mean - t) * (HALF_PI - theta) + amp * Math.sqrt(1 - x * x)) / Math.PI;
  }
  const above = hi - t;
  fractionAboveLast = above / (hi - lo);
  return (above * above) / (2 * (hi - lo));
}

function averageMethod(tmin: number, tmax: number, lower: number, upper: number): number {
  // McMaster & Wilhelm 1997 method 1: average first, then floor at zero.
  const lo = tmin < upper ? tmin : upper;
  const hi = tmax < upper ? tmax : upper;
  const dd = (lo + hi) / 2 - lower;
  return dd > 0 ? dd : 0;
}

function curveMethod(p: Prepared, tmin: number, tmax: number, nextTmin: number): number {
  const { shape, lower, upper } = p;
  let aL = areaAbove(shape, tmin, tmax, lower);
  let aU = areaAbove(shape, tmin, tmax, upper);
  let fU = fractionAboveLast;
  if (p.isDouble) {
    // The afternoon half runs from tmax down to the next morning's minimum. A data set may give a
    // next minimum above today's maximum; the half-curve then simply runs the other way.
    const lo = nextTmin < tmax ? nextTmin : tmax;
    const hi = nextTmin < tmax ? tmax : nextTmin;
    aL = (aL + areaAbove(shape, lo, hi, lower)) / 2;
    aU = (aU + areaAbove(shape, lo, hi, upper)) / 2;
    fU = (fU + fractionAboveLast) / 2;
  }
  let dd = aL - aU;
  if (p.cutoff !== CutoffCode.Horizontal && upper !== Number.POSITIVE_INFINITY) {
    // UC IPM: vertical removes the whole strip between the thresholds while T > TU; intermediate
    // removes the area above TU a second time, but never more than that strip.
    const strip = (upper - lower) * fU;
    dd -= p.cutoff === CutoffCode.Vertical ? strip : aU < strip ? aU : strip;
  }
  return dd > 0 ? dd : 0;
}

function dayValue(p: Prepared, tmin: number, tmax: number, nextTmin: number): number {
  return p.shape === Shape.Average ? averageMethod(tmin, tmax, p.lower, p.upper) : curveMethod(p, tmin, tmax, nextTmin);
}

/** One day's degree-days. The double methods use `nextTmin` for the afternoon half (today's minimum when absent). */
export function degreeDaysForDay(tmin: number, tmax: number, nextTmin: number | undefined, options: DegreeDayOptions): number {
  const p = prepare(options);
  checkDay(tmin, tmax, null);
  if (nextTmin !== undefined && !Number.isFinite(nextTmin)) throw new CareInputError('The next minimum temperature must be a number.', 'nextTmin');
  return dayValue(p, tmin, tmax, nextTmin ?? tmin);
}

/** Daily and running totals, unrounded, in the order given. The last day stands in for its own next minimum. */
export function degreeDaySeries(
  days: DailyTemperature[],
  options: DegreeDayOptions,
): { total: number; days: { date: IsoDate; dd: number; cumulative: number }[] } {
  const p = prepare(options);
  let total = 0;
  const out = days.map((day, i) => {
    checkDay(day.tmin, day.tmax, i);
    const dd = dayValue(p, day.tmin, day.tmax, days[i + 1]?.tmin ?? day.tmin);
    total += dd;
    return { date: day.date, dd, cumulative: total };
  });
  return { total, days: out };
}

/**
 * Running totals for a season. This is the hot path of the window benchmark: options are read
 * once and the loop allocates nothing per day.
 */
export function accumulate(days: DailyTemperature[], options: DegreeDayOptions): Float64Array {
  const p = prepare(options);
  const n = days.length;
  const out = new Float64Array(n);
  let total = 0;
  for (let i = 0; i < n; i++) {
    const day = days[i] as DailyTemperature;
    checkDay(day.tmin, day.tmax, i);
    const next = i + 1 < n ? (days[i + 1] as DailyTemperature).tmin : day.tmin;
    total += dayValue(p, day.tmin, day.tmax, next);
    out[i] = total;
  }
  return out;
}

/** The same running totals from parallel arrays, for callers that keep a season as typed arrays. */
export function accumulateExtremes(tmin: ArrayLike<number>, tmax: ArrayLike<number>, options: DegreeDayOptions, out?: Float64Array): Float64Array {
  if (tmin.length !== tmax.length) throw new CareInputError('The minimum and maximum series differ in length.', 'tmax');
  const p = prepare(options);
  const n = tmin.length;
  const result = out && out.length >= n ? out : new Float64Array(n);
  let total = 0;
  for (let i = 0; i < n; i++) {
    const lo = tmin[i] as number;
    const hi = tmax[i] as number;
    checkDay(lo, hi, i);
    total += dayValue(p, lo, hi, i + 1 < n ? (tmin[i + 1] as number) : lo);
    result[i] = total;
  }
  return result;
}

export function celsiusToFahrenheit(c: number): number {
  return c * 1.8 + 32;
}

export function fahrenheitToCelsius(f: number): number {
  return (f - 32) / 1.8;
}

/** A degree-day total is a temperature difference, so it scales without the 32° offset. */
export function degreeDaysToFahrenheit(celsiusDegreeDays: number): number {
  return celsiusDegreeDays * 1.8;
}

export function degreeDaysToCelsius(fahrenheitDegreeDays: number): number {
  return fahrenheitDegreeDays / 1.8;
}

function inWinklerSeason(date: IsoDate, hemisphere: Hemisphere): boolean {
  const month = monthOf(date);
  return hemisphere === 'north' ? month >= 4 && month <= 10 : month >= 10 || month <= 4;
}

/**
 * Winkler index in °C·days: 1 April–31 October in the north, 1 October–30 April in the south,
 * average method, base 10 °C, no upper threshold. Summed from daily values (Amerine & Winkler
 * worked from monthly means, which come out slightly lower). Pass one season's days.
 */
export function winklerIndex(days: DailyTemperature[], hemisphere: Hemisphere): number {
  let total = 0;
  days.forEach((day, i) => {
    checkDay(day.tmin, day.tmax, i);
    if (inWinklerSeason(day.date, hemisphere)) total += averageMethod(day.tmin, day.tmax, 10, Number.POSITIVE_INFINITY);
  });
  return total;
}

export type WinklerRegion = 'too cool' | 'Ia' | 'Ib' | 'II' | 'III' | 'IV' | 'V' | 'too hot';

const WINKLER_SOURCE_ORIGINAL = 'Amerine & Winkler 1944, Hilgardia 15:493–673';
const WINKLER_SOURCE_JONES = 'Jones et al. 2010, Am. J. Enol. Vitic. 61:313–326 (refining Amerine & Winkler 1944)';

// Upper bounds in °F·days as published; the band includes its upper bound (≤ / >) because the
// published integer ranges leave gaps such as 2500–2501.
const WINKLER_BANDS: { region: WinklerRegion; upperF: number; source: string }[] = [
  { region: 'too cool', upperF: 1500, source: WINKLER_SOURCE_JONES },
  { region: 'Ia', upperF: 2000, source: WINKLER_SOURCE_JONES },
  { region: 'Ib', upperF: 2500, source: WINKLER_SOURCE_JONES },
  { region: 'II', upperF: 3000, source: WINKLER_SOURCE_ORIGINAL },
  { region: 'III', upperF: 3500, source: WINKLER_SOURCE_ORIGINAL },
  { region: 'IV', upperF: 4000, source: WINKLER_SOURCE_ORIGINAL },
  { region: 'V', upperF: 4900, source: WINKLER_SOURCE_JONES },
];

function formatC(f: number): string {
  return String(Math.round(f / 1.8));
}

function winklerLabel(region: WinklerRegion, lowerF: number | null, upperF: number | null): string {
  if (region === 'too cool') return `Cooler than Region Ia (under ${formatC(1500)} °C·days)`;
  if (region === 'too hot') return `Hotter than Region V (over ${formatC(4900)} °C·days)`;
  return `Region ${region} (${formatC(lowerF ?? 0)}–${formatC(upperF ?? 0)} °C·days)`;
}

/**
 * Winkler region for an index. Compared in °C against the exact conversions of the published °F
 * bounds, so a value converted from a boundary lands in the band the °F table puts it in.
 * "too cool" is strictly below 1500 °F·days (Ia starts at 1500 inclusive).
 */
export function winklerRegion(index: number, unit: TemperatureUnit = 'C'): { region: WinklerRegion; label: string; source: string } {
  if (!Number.isFinite(index)) throw new CareInputError('The Winkler index must be a number.', 'index');
  const indexC = unit === 'C' ? index : index / 1.8;
  let lowerF: number | null = null;
  for (const band of WINKLER_BANDS) {
    const upperC = band.upperF / 1.8;
    const isInside = band.region === 'too cool' ? indexC < upperC : indexC <= upperC;
    if (isInside) return { region: band.region, label: winklerLabel(band.region, lowerF, band.upperF), source: band.source };
    lowerF = band.upperF;
  }
  return { region: 'too hot', label: winklerLabel('too hot', null, null), source: WINKLER_SOURCE_JONES };
}
