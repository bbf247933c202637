import { MONTH_NAMES } from './month-names';

// Calendar dates travel as `YYYY-MM-DD` strings. Arithmetic runs in UTC so that a date never
// slips a day with the machine's time zone or a daylight-saving change.

export type IsoDate = string;

const DAY_MS = 86_400_000;

export function toUtcMs(date: IsoDate): number {
  const [y, m, d] = date.split('-').map(Number) as [number, number, number];
  return Date.UTC(y, m - 1, d);
}

export function fromUtcMs(ms: number): IsoDate {
  return new Date(ms).toISOString().slice(0, 10);
}

export function makeDate(year: number, month: number, day: number): IsoDate {
  return fromUtcMs(Date.UTC(year, month - 1, day));
}

export function addDays(date: IsoDate, days: number): IsoDate {
  return fromUtcMs(toUtcMs(date) + days * DAY_MS);
}

/** Whole days from `a` to `b` (positive when b is later). */
export function daysBetween(a: IsoDate, b: IsoDate): number {
  return Math.round((toUtcMs(b) - toUtcMs(a)) / DAY_MS);
}

export function yearOf(date: IsoDate): number {
  return Number(date.slice(0, 4));
}

export function monthOf(date: IsoDate): number {
  return Number(date.slice(5, 7));
}

export function dayOfYear(date: IsoDate): number {
  return daysBetween(makeDate(yearOf(date), 1, 1), date) + 1;
}

export function isLeapYear(year: number): boolean {
  return (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
}

export function compareDates(a: IsoDate, b: IsoDate): number {
  return a < b ? -1 : a > b ? 1 : 0;
}

/** Every date from `from` to `to`, both included. */
export function dateRange(from: IsoDate, to: IsoDate): IsoDate[] {
  const out: IsoDate[] = [];
  for (let ms = toUtcMs(from); ms <= toUtcMs(to); ms += DAY_MS) out.push(fromUtcMs(ms));
  return out;
}

/** Today's calendar date in an IANA time zone. */
export function todayIn(timeZone: string, now: Date = new Date()): IsoDate {
  return new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }).format(now);
}

export type Hemisphere = 'north' | 'south';

export function hemisphereOf(latitude: number): Hemisphere {
  return latitude < 0 ? 'south' : 'north';
}

/** True for a `YYYY-MM-DD` string naming a day that exists (no 30 February). */
export function isIsoDate(value: string): boolean {
  if (!/^\d{4}-\d{2}-\d{2}$/.test(value)) return false;
  const [y, m, d] = value.split('-').map(Number) as [number, number, number];
  return makeDate(y, m, d) === value;
}

/** Day of the month a date falls on, clamped to the month's length (31 April → 30 April). */
export function clampedDate(year: number, month: number, day: number): IsoDate {
  const lastDay = new Date(Date.UTC(year, month, 0)).getUTCDate();
  return makeDate(year, month, Math.min(day, lastDay));
}

/**
 * Advice written for the north, reworded for a southern site: each month name moves six months on.
 * "June drop" is the trade's name for a stage, not a date, so it becomes a plain description.
 */
export function southernMonthWords(text: string): string {
  return text
    .replace(/\bJune drop\b/g, 'early-summer fruit drop')
    .replace(/\b(January|February|March|April|May|June|July|August|September|October|November|December)\b/g, (name) => MONTH_NAMES[(MONTH_NAMES.indexOf(name) + 6) % 12] ?? name);
}
