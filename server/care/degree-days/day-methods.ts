import { CareInputError } from '../errors';
import type { DegreeDayOptions } from './types';

// One day's degree-days from its extremes. Every formula is unit-agnostic: temperatures and
// thresholds only have to share a unit, so callers convert and this file never guesses.
//
// The triangle and sine methods are written with one building block, A(T) = the daily mean of
// max(T(t) − T, 0), as in the UC IPM definitions reproduced in Zalom et al. 1983 (UC DANR Leaflet
// 21373): horizontal = A(TL) − A(TU). "Intermediate" is ambiguous in the literature; we use the
// UC IPM definition (subtract the area above TU once more, capped at the vertical strip) so that
// results match the UC IPM calculator and the published phenology models built on it.

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

export function prepare(options: DegreeDayOptions): Prepared {
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
export function checkDay(tmin: number, tmax: number, index: number | null): void {
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

export function averageMethod(tmin: number, tmax: number, lower: number, upper: number): number {
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

export function dayValue(p: Prepared, tmin: number, tmax: number, nextTmin: number): number {
  return p.shape === Shape.Average ? averageMethod(tmin, tmax, p.lower, p.upper) : curveMethod(p, tmin, tmax, nextTmin);
}

/** One day's degree-days. The double methods use `nextTmin` for the afternoon half (today's minimum when absent). */
export function degreeDaysForDay(tmin: number, tmax: number, nextTmin: number | undefined, options: DegreeDayOptions): number {
  const p = prepare(options);
  checkDay(tmin, tmax, null);
  if (nextTmin !== undefined && !Number.isFinite(nextTmin)) throw new CareInputError('The next minimum temperature must be a number.', 'nextTmin');
  return dayValue(p, tmin, tmax, nextTmin ?? tmin);
}
