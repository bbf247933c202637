import { z } from 'zod';
import { READING_LIMIT_C, temperatureUnitSchema, toCelsius } from './readings';

// A site's season at a glance (/sites/:siteId/weather), its monthly normals and its station link.

const fromQuery = (v: unknown) => (v === '' ? undefined : typeof v === 'string' && /^-?\d+(\.\d+)?$/.test(v) ? Number(v) : v);

/** The bases the site chart offers: 5 °C for fruit trees and bushes, 10 °C for vines (the catalogue's bases). */
export const chartBases = [5, 10] as const;

export const weatherQuerySchema = z.object({
  season: z.preprocess(fromQuery, z.number().int('A season is a whole year').min(1900, 'Choose a season from 1900').max(2200, 'Choose a season before 2200').optional()),
  base: z.preprocess(fromQuery, z.union([z.literal(5), z.literal(10)], { message: 'Choose base 5 or 10 °C' }).default(5)),
});

export const normalsSources = ['manual', 'computed', 'built-in'] as const;

export const monthlyNormalSchema = z.object({ month: z.number(), tminC: z.number(), tmaxC: z.number() });
export type MonthlyNormalDto = z.infer<typeof monthlyNormalSchema>;

export const siteNormalsSchema = z.object({
  source: z.enum(normalsSources),
  /** Twelve months, January first; the engine's built-in year when the site has none of its own. */
  months: z.array(monthlyNormalSchema),
});
export type SiteNormals = z.infer<typeof siteNormalsSchema>;

const normalMonth = z.object({
  month: z.number().int().min(1, 'A month runs from 1 to 12').max(12, 'A month runs from 1 to 12'),
  tmin: z.number({ message: 'Give the mean minimum as a number' }),
  tmax: z.number({ message: 'Give the mean maximum as a number' }),
});

export const normalsUpdateSchema = z.object({
  unit: temperatureUnitSchema.default('C'),
  months: z.array(normalMonth).length(12, 'Give all twelve months'),
}).superRefine((body, ctx) => {
  const seen = new Set<number>();
  body.months.forEach((m, i) => {
    if (seen.has(m.month)) ctx.addIssue({ code: 'custom', path: ['months', i, 'month'], message: `Month ${m.month} appears twice` });
    seen.add(m.month);
    if (m.tmin > m.tmax) ctx.addIssue({ code: 'custom', path: ['months', i, 'tmin'], message: 'The mean minimum is above the mean maximum' });
    for (const key of ['tmin', 'tmax'] as const) {
      if (Math.abs(toCelsius(m[key], body.unit)) > READING_LIMIT_C) ctx.addIssue({ code: 'custom', path: ['months', i, key], message: 'Outside −60…60 °C' });
    }
  });
});
export type NormalsUpdate = z.input<typeof normalsUpdateSchema>;

export const stationLinkSchema = z.object({
  stationId: z.string().trim().max(64, 'Use at most 64 characters')
    .regex(/^[A-Za-z0-9._-]*$/, 'Use letters, digits, dots, dashes or underscores')
    .nullable()
    .transform((v) => (v ? v : null)),
});
export type StationLink = z.input<typeof stationLinkSchema>;

export const stationPullSchema = z.object({
  stationId: z.string(),
  from: z.string().nullable(),
  to: z.string().nullable(),
  added: z.number(),
  latestReading: z.string().nullable(),
});
export type StationPull = z.infer<typeof stationPullSchema>;

export const dateRangeSchema = z.object({ from: z.string(), to: z.string() });

export const siteWeatherSchema = z.object({
  season: z.number(),
  /** Today at the site; days up to yesterday without a reading count as missing. */
  today: z.string(),
  start: z.string(),
  end: z.string(),
  base: z.number(),
  /** The newest reading the site holds, in any season. */
  latestReading: z.string().nullable(),
  stationId: z.string().nullable(),
  normals: siteNormalsSchema,
  degreeDays: z.object({
    /** Running totals from `start`, one per day: readings where there are any, normals elsewhere. */
    season: z.array(z.number()),
    /** The same from the normals alone: the usual year. */
    normal: z.array(z.number()),
    /** Per day: 1 read, 0 filled from normals. */
    isReading: z.array(z.number()),
    /** The last day that counts as measured weather: yesterday at the site, or the season's end for a past season. */
    through: z.string(),
  }),
  missing: z.object({ count: z.number(), ranges: z.array(dateRangeSchema) }),
  readingDays: z.number(),
  chill: z.object({
    /** 1 October (1 April in the south) to the end of February (of August). */
    from: z.string(),
    to: z.string(),
    through: z.string().nullable(),
    chillHours: z.number(),
    utahUnits: z.number(),
    /** Running totals per day from `from` to `through`. */
    dailyHours: z.array(z.number()),
    dailyUtah: z.array(z.number()),
    missingDays: z.number(),
  }),
});
export type SiteWeather = z.infer<typeof siteWeatherSchema>;
