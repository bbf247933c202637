import { clampedDate, hemisphereOf, monthOf, type IsoDate } from '../dates';

// The check's calendar. Dates are compared as month and day on the northern calendar, so a period
// such as "November to early March" is one pair of numbers and a southern date is moved half a
// year before it is judged.

export type Md = number; // month * 100 + day, northern-hemisphere equivalent

export const md = (month: number, day: number): Md => month * 100 + day;
export const between = (x: Md, from: Md, to: Md): boolean => (from <= to ? x >= from && x <= to : x >= from || x <= to);

// Leaf fall to bud burst: "November to early March" (S20); bud burst closes it around 10 March.
export const DORMANT = [md(11, 1), md(3, 10)] as const;
export const SUMMER = [md(6, 1), md(8, 31)] as const;
export const FORMATIVE_SPRING = [md(3, 20), md(4, 30)] as const;
export const SWEET_CHERRY_UK = [md(7, 21), md(8, 31)] as const;
export const SWEET_CHERRY_US = [md(7, 1), md(8, 31)] as const;
// Calendar stand-ins for stages the US sources name (delayed dormant to early bloom; just before
// bloom to two weeks after petal fall): the stages are published, these dates are our estimate.
export const US_LATE_DORMANT = [md(3, 15), md(4, 30)] as const;
export const US_PEACH_BLOOM = [md(4, 1), md(5, 15)] as const;
export const LEAF_CURL_SHELTER = [md(11, 1), md(5, 15)] as const;

/** The same day of the year half a year on: what a southern date corresponds to in the north. */
export function northernEquivalent(date: IsoDate, latitude: number): Md {
  const month = monthOf(date);
  const day = Number(date.slice(8, 10));
  if (hemisphereOf(latitude) === 'north') return md(month, day);
  const shifted = ((month + 5) % 12) + 1;
  // 31 August has no twin in February; a non-leap year keeps the answer the same every year.
  return md(shifted, Number(clampedDate(2001, shifted, day).slice(8, 10)));
}
