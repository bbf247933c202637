import * as SunCalc from 'suncalc';
import { CareInputError } from './errors';
import type { IsoDate } from './dates';

// Sun times come from suncalc 2 (upper limb at −0.833°, the same convention as USNO and NOAA).
// Times leave this file as ISO 8601 strings in the site's own clock, rounded to the minute,
// because that is how growers read them and how the published check values are printed.

/** Ladder and cutting work should stop this long before sunset (safety.md §5: a design choice). */
export const LADDER_DAYLIGHT_MARGIN_MINUTES = 30;

const MINUTE_MS = 60_000;

export interface Daylight {
  sunrise: string | null;
  sunset: string | null;
  solarNoon: string;
  civilDusk: string | null;
  dayLengthMinutes: number;
  finishLadderWorkBy: string | null;
}

const offsetFormatters = new Map<string, Intl.DateTimeFormat>();

function offsetFormatter(timeZone: string): Intl.DateTimeFormat {
  let formatter = offsetFormatters.get(timeZone);
  if (!formatter) {
    try {
      formatter = new Intl.DateTimeFormat('en-US', { timeZone, timeZoneName: 'longOffset' });
    } catch {
      throw new CareInputError(`"${timeZone}" is not a known IANA time zone, e.g. Europe/London.`, 'timeZone');
    }
    offsetFormatters.set(timeZone, formatter);
  }
  return formatter;
}

/** Minutes east of UTC that `timeZone` keeps at `instant` (daylight saving included). */
export function timeZoneOffsetMinutes(timeZone: string, instant: Date): number {
  const name = offsetFormatter(timeZone).formatToParts(instant).find((part) => part.type === 'timeZoneName')?.value ?? 'GMT';
  // "GMT" alone means zero; otherwise "GMT+05:45" or, for historical local mean time, "GMT-00:01:15".
  const match = /^GMT([+-])(\d{2}):(\d{2})(?::(\d{2}))?$/.exec(name);
  if (!match) return 0;
  const [, sign, hours, minutes, seconds] = match;
  const total = Number(hours) * 60 + Number(minutes) + Number(seconds ?? 0) / 60;
  return sign === '-' ? -total : total;
}

function formatOffset(minutes: number): string {
  const sign = minutes < 0 ? '-' : '+';
  const abs = Math.abs(Math.round(minutes));
  return `${sign}${String(Math.floor(abs / 60)).padStart(2, '0')}:${String(abs % 60).padStart(2, '0')}`;
}

/** `2026-06-21T21:21:00+01:00`: the instant in the clock of `timeZone` (UTC when none is given). */
export function formatInTimeZone(instant: Date, timeZone?: string): string {
  const offset = timeZone === undefined ? 0 : Math.round(timeZoneOffsetMinutes(timeZone, instant));
  const local = new Date(instant.getTime() + offset * MINUTE_MS);
  return `${local.toISOString().slice(0, 19)}${formatOffset(offset)}`;
}

function roundToMinute(instant: Date): Date {
  return new Date(Math.round(instant.getTime() / MINUTE_MS) * MINUTE_MS);
}

function parseDate(date: IsoDate): [number, number, number] {
  const match = /^(\d{4})-(\d{2})-(\d{2})$/.exec(date);
  const [y, m, d] = match ? [Number(match[1]), Number(match[2]), Number(match[3])] : [Number.NaN, 0, 0];
  const check = new Date(Date.UTC(y, m - 1, d));
  if (!match || check.getUTCFullYear() !== y || check.getUTCMonth() !== m - 1 || check.getUTCDate() !== d) {
    throw new CareInputError(`"${date}" is not a real date in the form YYYY-MM-DD.`, 'date');
  }
  return [y, m, d];
}

/**
 * Noon on `date` as an instant. suncalc 2 answers for the solar day nearest the instant it is
 * given, so noon of the grower's own calendar date picks the right sunrise and sunset even far
 * from the zone's meridian. Without a zone, mean solar noon at the longitude stands in.
 */
export function localNoon(date: IsoDate, longitude: number, timeZone?: string): Date {
  const [y, m, d] = parseDate(date);
  const noonUtc = Date.UTC(y, m - 1, d, 12);
  if (timeZone === undefined) return new Date(noonUtc - (longitude / 15) * 3_600_000);
  // The offset at noon may differ from the offset at the first guess on a clock-change day.
  let instant = noonUtc - timeZoneOffsetMinutes(timeZone, new Date(noonUtc)) * MINUTE_MS;
  instant = noonUtc - timeZoneOffsetMinutes(timeZone, new Date(instant)) * MINUTE_MS;
  return new Date(instant);
}

function checkPosition(latitude: number, longitude: number): void {
  if (!Number.isFinite(latitude) || latitude < -90 || latitude > 90) throw new CareInputError('Latitude runs from -90 to 90.', 'latitude');
  if (!Number.isFinite(longitude) || longitude < -180 || longitude > 180) throw new CareInputError('Longitude runs from -180 to 180.', 'longitude');
}

/**
 * Sunrise, sunset, civil dusk and day length on a date, with the time by which ladder and cutting
 * work should be finished (sunset − 30 min). In polar day or night sunrise and sunset are null and
 * the day lasts 1440 or 0 minutes; civil dusk is null whenever the sun never sinks 6° below the
 * horizon (for instance midsummer nights north of about 60°).
 */
export function daylight(latitude: number, longitude: number, date: IsoDate, timeZone?: string): Daylight {
  checkPosition(latitude, longitude);
  const times = SunCalc.getTimes(localNoon(date, longitude, timeZone), latitude, longitude);
  const format = (instant: Date | null): string | null => (instant ? formatInTimeZone(roundToMinute(instant), timeZone) : null);
  const sunset = times.sunset ? roundToMinute(times.sunset) : null;
  const hasRiseAndSet = times.sunrise !== null && times.sunset !== null;
  const dayLengthMinutes = hasRiseAndSet
    ? Math.round(((times.sunset as Date).getTime() - (times.sunrise as Date).getTime()) / MINUTE_MS)
    : times.alwaysUp === true ? 1440 : 0;
  return {
    sunrise: hasRiseAndSet ? format(times.sunrise) : null,
    sunset: hasRiseAndSet ? format(times.sunset) : null,
    solarNoon: formatInTimeZone(roundToMinute(times.solarNoon), timeZone),
    civilDusk: format(times.dusk),
    dayLengthMinutes,
    finishLadderWorkBy: hasRiseAndSet && sunset ? formatInTimeZone(new Date(sunset.getTime() - LADDER_DAYLIGHT_MARGIN_MINUTES * MINUTE_MS), timeZone) : null,
  };
}
