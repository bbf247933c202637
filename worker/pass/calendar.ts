import { addDays, daysBetween, hemisphereOf, monthOf, seasonStart, yearOf, type IsoDate } from '../../server/care';

// Which seasons a day's pass refreshes, and what day and hour it is at a site.

/** The season a day belongs to: the calendar year in the north, July to June in the south. */
export function seasonOf(date: IsoDate, latitude: number): number {
  return hemisphereOf(latitude) === 'south' && monthOf(date) < 7 ? yearOf(date) - 1 : yearOf(date);
}

// Dormant-season work belongs to the next season and opens about two months before it starts
// (November in the north); with the longest lead time (21 days) on top, three months ahead is enough.
const NEXT_SEASON_LOOKAHEAD_DAYS = 92;

export function seasonsToRefresh(date: IsoDate, latitude: number): number[] {
  const season = seasonOf(date, latitude);
  const nextStart = seasonStart(season + 1, hemisphereOf(latitude));
  return daysBetween(date, nextStart) <= NEXT_SEASON_LOOKAHEAD_DAYS ? [season, season + 1] : [season];
}

export const isMonday = (date: IsoDate): boolean => new Date(`${date}T12:00:00Z`).getUTCDay() === 1;

export const plusDays = addDays;

const clocks = new Map<string, Intl.DateTimeFormat>();

/** The calendar date and hour (0–23) at `instant` in an IANA zone; null for a zone the runtime does not know. */
export function localClock(timeZone: string, instant: Date): { date: IsoDate; hour: number } | null {
  let clock = clocks.get(timeZone);
  if (!clock) {
    try {
      clock = new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit', hour: '2-digit', hourCycle: 'h23' });
    } catch {
      return null;
    }
    clocks.set(timeZone, clock);
  }
  const parts = Object.fromEntries(clock.formatToParts(instant).map((p) => [p.type, p.value]));
  return { date: `${parts.year}-${parts.month}-${parts.day}`, hour: Number(parts.hour) };
}
