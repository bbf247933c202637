import type { IsoDate } from '../dates';
import { CareInputError } from '../errors';
import { checkDay, dayValue, prepare } from './day-methods';
import type { DailyTemperature, DegreeDayOptions } from './types';

// Degree-days over a run of days: daily values with running totals, and the bare running totals the
// care windows accumulate for every site. Options are checked once per call, never per day.

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
