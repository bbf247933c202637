import { daysBetween, hemisphereOf, isLeapYear, makeDate, type IsoDate } from '../dates';
import { CareInputError } from '../errors';
import { FROM_MEMORY } from '../sources';

// Monthly climate normals: checking a site's own, the built-in temperate default for sites without
// any, and turning twelve monthly values into a smooth day-by-day curve.

export interface MonthlyNormal {
  month: number;
  tmin: number;
  tmax: number;
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

/** The default for a site: the lowland-England year, six months on in the southern hemisphere. */
export function defaultNormals(latitude: number): MonthlyNormal[] {
  if (hemisphereOf(latitude) === 'north') return LOWLAND_ENGLAND.map((n) => ({ ...n }));
  return LOWLAND_ENGLAND.map((n) => ({ ...n, month: ((n.month + 5) % 12) + 1 }));
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
