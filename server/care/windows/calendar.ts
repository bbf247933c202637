import type { MonthDay } from '../catalogue';
import { clampedDate, type Hemisphere, type IsoDate } from '../dates';
import { MONTH_NAMES } from '../month-names';

// Calendar bounds placed in a season and hemisphere, and dates written the way growers read them.

/** "24 July": dates in reasons are read by growers, not parsed. */
export function formatDay(date: IsoDate): string {
  return `${Number(date.slice(8, 10))} ${MONTH_NAMES[Number(date.slice(5, 7)) - 1] ?? ''}`;
}

const DAYS_IN_MONTH = [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];

/**
 * A northern month and day in a season, six months on in the south. A bound on a month's last day
 * (30 June, 28 or 29 February) means the end of that month, so it lands on the last day of the
 * month it moves to: the end of June becomes the end of December, not 30 December.
 */
export function calendarDate(bound: MonthDay & { yearOffset?: number }, season: number, hemisphere: Hemisphere): IsoDate {
  const shift = hemisphere === 'south' ? 6 : 0;
  const months = (season + (bound.yearOffset ?? 0)) * 12 + (bound.month - 1) + shift;
  const isMonthEnd = bound.day >= (DAYS_IN_MONTH[bound.month - 1] ?? 31);
  return clampedDate(Math.floor(months / 12), (months % 12) + 1, isMonthEnd ? 31 : bound.day);
}
