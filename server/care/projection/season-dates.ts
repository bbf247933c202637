import { addDays, daysBetween, fromUtcMs, makeDate, toUtcMs, type Hemisphere, type IsoDate } from '../dates';
import { CareInputError } from '../errors';

// Where a season starts and ends in each hemisphere, and its dates as strings, worked out once per
// season and shared by every site.

export function seasonStart(season: number, hemisphere: Hemisphere): IsoDate {
  return hemisphere === 'north' ? makeDate(season, 1, 1) : makeDate(season, 7, 1);
}

export function seasonEnd(season: number, hemisphere: Hemisphere): IsoDate {
  return addDays(seasonStart(season + 1, hemisphere), -1);
}

export function checkSeason(season: number): void {
  if (!Number.isInteger(season) || season < 1800 || season > 2200) {
    throw new CareInputError('The season must be a year such as 2025.', 'season');
  }
}

// The season's dates as strings, shared between sites: comparing a reading's date with the
// expected string is far cheaper than parsing it, and readings usually arrive in order.
const seasonDateCache = new Map<string, IsoDate[]>();

export function datesFrom(start: IsoDate, length: number): IsoDate[] {
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

export function seasonFrame(season: number, hemisphere: Hemisphere): { start: IsoDate; end: IsoDate; dates: IsoDate[] } {
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
