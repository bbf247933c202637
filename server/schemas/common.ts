import { z } from 'zod';

export const uuidSchema = z.uuid({ message: 'Must be a valid id' });

/** A calendar date as `YYYY-MM-DD` that really exists (no 31 February). */
export const isoDateSchema = z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'Use the form YYYY-MM-DD').refine((value) => {
  const [y, m, d] = value.split('-').map(Number) as [number, number, number];
  const date = new Date(Date.UTC(y, m - 1, d));
  return date.getUTCFullYear() === y && date.getUTCMonth() === m - 1 && date.getUTCDate() === d;
}, 'Not a real date');

export const latitudeSchema = z.number({ message: 'Latitude must be a number' }).min(-90, 'Latitude runs from -90 to 90').max(90, 'Latitude runs from -90 to 90');
export const longitudeSchema = z.number({ message: 'Longitude must be a number' }).min(-180, 'Longitude runs from -180 to 180').max(180, 'Longitude runs from -180 to 180');

export const timeZoneSchema = z.string().min(1, 'Choose a time zone').refine((tz) => {
  try {
    new Intl.DateTimeFormat('en', { timeZone: tz });
    return true;
  } catch {
    return false;
  }
}, 'Not a known IANA time zone, e.g. Europe/London');

/** Query strings arrive as text; this turns "" into undefined so optional filters stay optional. */
export const optionalText = z.preprocess((v) => (v === '' ? undefined : v), z.string().trim().optional());
