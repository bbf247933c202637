import { describe, expect, it } from 'vitest';
import { daylight, formatInTimeZone, localNoon, timeZoneOffsetMinutes } from '../../server/care/daylight';
import { CareInputError } from '../../server/care/degree-days';

/** Minutes between a "HH:MM" clock reading and the clock part of an ISO string with offset. */
function minutesOff(iso: string | null, clock: string): number {
  expect(iso).not.toBeNull();
  const [h, m] = clock.split(':').map(Number) as [number, number];
  const [ih, im] = (iso as string).slice(11, 16).split(':').map(Number) as [number, number];
  return Math.abs(ih * 60 + im - (h * 60 + m));
}

describe('daylight — published sunrise and sunset within 2 minutes', () => {
  it('Atlanta, 2009-09-06: rise 07:15, set 19:56 EDT', () => {
    // USNO rise/set times as quoted in the PyEphem documentation ("rise-set"), via degree-days.md §6 row 1
    const day = daylight(33.8, -84.4, '2009-09-06', 'America/New_York');
    expect(minutesOff(day.sunrise, '07:15')).toBeLessThanOrEqual(2);
    expect(minutesOff(day.sunset, '19:56')).toBeLessThanOrEqual(2);
    expect(minutesOff(day.solarNoon, '13:36')).toBeLessThanOrEqual(2);
    expect(day.sunrise?.endsWith('-04:00')).toBe(true);
  });

  it('Cape May NJ, 2002-03-20: rise 06:04, set 18:12 EST', () => {
    // USNO values quoted on S. Kluge's "equinox sunrise" page, via degree-days.md §6 row 2
    const day = daylight(38.9, -74.9, '2002-03-20', 'America/New_York');
    expect(minutesOff(day.sunrise, '06:04')).toBeLessThanOrEqual(2);
    expect(minutesOff(day.sunset, '18:12')).toBeLessThanOrEqual(2);
    expect(day.sunset?.endsWith('-05:00')).toBe(true);
  });

  it('Washington DC, 2025-01-13: rise 07:26, solar noon 12:17, set 17:08 EST', () => {
    // Newspaper astronomy column (secondary), via degree-days.md §6 row 3
    const day = daylight(38.8951, -77.0364, '2025-01-13', 'America/New_York');
    expect(minutesOff(day.sunrise, '07:26')).toBeLessThanOrEqual(2);
    expect(minutesOff(day.solarNoon, '12:17')).toBeLessThanOrEqual(2);
    expect(minutesOff(day.sunset, '17:08')).toBeLessThanOrEqual(2);
  });

  it('gives UTC times with +00:00 when no time zone is given', () => {
    // PyEphem documentation: Atlanta sunrise 2009-09-06 at 11:14:57 UTC
    const day = daylight(33.8, -84.4, '2009-09-06');
    expect(day.sunrise).toMatch(/^2009-09-06T11:1[3-7]:00\+00:00$/);
    expect(minutesOff(day.sunrise, '11:15')).toBeLessThanOrEqual(2);
  });
});

describe('daylight — derived values', () => {
  it('puts the finish-ladder-work time 30 minutes before sunset and dusk after sunset', () => {
    // safety.md §5 and §8 T32: finish by sunset − 30 min (a design choice)
    const day = daylight(51.4779, -0.0015, '2026-06-21', 'Europe/London');
    const sunset = Date.parse(day.sunset as string);
    expect(sunset - Date.parse(day.finishLadderWorkBy as string)).toBe(30 * 60_000);
    expect(Date.parse(day.civilDusk as string)).toBeGreaterThan(sunset);
    expect(day.sunset?.endsWith('+01:00')).toBe(true);
  });

  it('measures day length from sunrise to sunset', () => {
    const day = daylight(51.4779, -0.0015, '2026-12-21', 'Europe/London');
    const span = (Date.parse(day.sunset as string) - Date.parse(day.sunrise as string)) / 60_000;
    expect(Math.abs(day.dayLengthMinutes - span)).toBeLessThanOrEqual(1);
    // Roughly 7 h 50 min at Greenwich on the winter solstice (HM Nautical Almanac Office tables, from memory, unverified)
    expect(day.dayLengthMinutes).toBeGreaterThan(460);
    expect(day.dayLengthMinutes).toBeLessThan(480);
  });

  it('reports polar day and polar night without sunrise or sunset', () => {
    const summer = daylight(69.65, 18.96, '2026-06-21', 'Europe/Oslo');
    expect(summer).toMatchObject({ sunrise: null, sunset: null, dayLengthMinutes: 1440, finishLadderWorkBy: null });
    const winter = daylight(69.65, 18.96, '2026-12-21', 'Europe/Oslo');
    expect(winter).toMatchObject({ sunrise: null, sunset: null, dayLengthMinutes: 0, finishLadderWorkBy: null });
  });

  it('has no civil dusk on a white night', () => {
    const day = daylight(62, 10, '2026-06-21', 'Europe/Oslo');
    expect(day.sunset).not.toBeNull();
    expect(day.civilDusk).toBeNull();
  });

  it('answers for the grower’s calendar date far from the zone meridian', () => {
    const day = daylight(1.87, -157.4, '2026-06-21', 'Pacific/Kiritimati');
    expect(day.sunrise?.startsWith('2026-06-21T06:')).toBe(true);
    expect(day.sunset?.startsWith('2026-06-21T18:')).toBe(true);
  });

  it('rejects bad positions, dates and zones with a path', () => {
    const path = (fn: () => unknown): string | undefined => {
      try {
        fn();
      } catch (err) {
        return err instanceof CareInputError ? err.path : undefined;
      }
      return undefined;
    };
    expect(path(() => daylight(91, 0, '2026-01-01'))).toBe('latitude');
    expect(path(() => daylight(0, 181, '2026-01-01'))).toBe('longitude');
    expect(path(() => daylight(0, 0, '2026-02-30'))).toBe('date');
    expect(path(() => daylight(0, 0, '2026-01-01', 'Mars/Olympus'))).toBe('timeZone');
  });
});

describe('time-zone helpers', () => {
  it('reads the offset of a zone at an instant, daylight saving included', () => {
    expect(timeZoneOffsetMinutes('Europe/London', new Date('2026-07-01T12:00:00Z'))).toBe(60);
    expect(timeZoneOffsetMinutes('Europe/London', new Date('2026-01-01T12:00:00Z'))).toBe(0);
    expect(timeZoneOffsetMinutes('Asia/Kathmandu', new Date('2026-01-01T12:00:00Z'))).toBe(345);
    expect(timeZoneOffsetMinutes('America/St_Johns', new Date('2026-01-01T12:00:00Z'))).toBe(-210);
    expect(timeZoneOffsetMinutes('UTC', new Date('2026-01-01T12:00:00Z'))).toBe(0);
  });

  it('formats an instant as ISO 8601 with the zone offset', () => {
    const instant = new Date('2026-06-21T20:21:00Z');
    expect(formatInTimeZone(instant, 'Europe/London')).toBe('2026-06-21T21:21:00+01:00');
    expect(formatInTimeZone(instant)).toBe('2026-06-21T20:21:00+00:00');
    expect(formatInTimeZone(instant, 'America/St_Johns')).toBe('2026-06-21T17:51:00-02:30');
    expect(formatInTimeZone(new Date('2026-01-01T00:30:00Z'), 'Asia/Kathmandu')).toBe('2026-01-01T06:15:00+05:45');
    expect(Date.parse(formatInTimeZone(instant, 'Australia/Sydney'))).toBe(instant.getTime());
  });

  it('finds local noon on a clock-change day', () => {
    // UK clocks went forward at 01:00 UTC on 2026-03-29, so noon is 11:00 UTC that day.
    expect(localNoon('2026-03-29', 0, 'Europe/London').toISOString()).toBe('2026-03-29T11:00:00.000Z');
    expect(localNoon('2026-03-28', 0, 'Europe/London').toISOString()).toBe('2026-03-28T12:00:00.000Z');
    // Without a zone, mean solar noon at the longitude: 90° W is six hours behind Greenwich.
    expect(localNoon('2026-03-28', -90).toISOString()).toBe('2026-03-28T18:00:00.000Z');
  });
});
