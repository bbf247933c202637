import { z } from 'zod';
import { plantFormSchema, plantTypeCodeSchema } from './catalogue';
import { isoDateSchema, latitudeSchema, longitudeSchema, timeZoneSchema } from './common';

// The public tools' contract (routes/README.md). Outside checks rely on these shapes, so a field
// here is never renamed. Numbers are JSON numbers, dates `YYYY-MM-DD`, times ISO 8601 with offset.
// The client builds its tool forms on the same schemas.

/** More than this many days in one request is refused: a season is 366, so 1,000 is nearly three. */
export const MAX_TOOL_DAYS = 1000;

const temperature = (what: string) =>
  z.number({ message: `The ${what} temperature must be a number` }).min(-150, `The ${what} temperature looks wrong`).max(150, `The ${what} temperature looks wrong`);

export const dailyTemperatureSchema = z
  .object({ date: isoDateSchema, tmin: temperature('minimum'), tmax: temperature('maximum') })
  .refine((day) => day.tmin <= day.tmax, { message: 'The minimum is above the maximum', path: ['tmin'] });
export type DailyTemperatureInput = z.infer<typeof dailyTemperatureSchema>;

// Two rows for one date cannot both be right, and the double methods need to know which is "next".
const daysSchema = z
  .array(dailyTemperatureSchema, { message: 'Give the days as a list of { date, tmin, tmax }' })
  .max(MAX_TOOL_DAYS, `Send at most ${MAX_TOOL_DAYS.toLocaleString('en-GB')} days at a time`)
  .superRefine((days, ctx) => {
    const seen = new Set<string>();
    days.forEach((day, i) => {
      if (seen.has(day.date)) ctx.addIssue({ code: 'custom', message: `${day.date} appears twice`, path: [i, 'date'] });
      seen.add(day.date);
    });
  });

// ---- Degree-days ----

export const degreeDayMethods = ['average', 'single-triangle', 'double-triangle', 'single-sine', 'double-sine'] as const;
export const degreeDayCutoffs = ['horizontal', 'intermediate', 'vertical'] as const;
export const temperatureUnits = ['C', 'F'] as const;

export const degreeDayMethodLabels: Record<(typeof degreeDayMethods)[number], string> = {
  average: 'Average of min and max',
  'single-triangle': 'Single triangle',
  'double-triangle': 'Double triangle',
  'single-sine': 'Single sine',
  'double-sine': 'Double sine',
};

export const degreeDaysRequestSchema = z
  .object({
    unit: z.enum(temperatureUnits, { message: 'Choose °C or °F' }),
    method: z.enum(degreeDayMethods, { message: 'Choose a method' }),
    cutoff: z.enum(degreeDayCutoffs, { message: 'Choose a cutoff' }).default('horizontal'),
    lower: z.number({ message: 'The lower threshold must be a number' }).min(-100, 'The lower threshold looks wrong').max(100, 'The lower threshold looks wrong'),
    upper: z.number({ message: 'The upper threshold must be a number' }).min(-100, 'The upper threshold looks wrong').max(150, 'The upper threshold looks wrong').optional(),
    days: daysSchema,
  })
  .refine((body) => body.upper === undefined || body.upper > body.lower, { message: 'The upper threshold must be above the lower one', path: ['upper'] });
export type DegreeDaysRequest = z.input<typeof degreeDaysRequestSchema>;

export const degreeDaysResponseSchema = z.object({
  total: z.number(),
  days: z.array(z.object({ date: z.string(), dd: z.number(), cumulative: z.number() })),
});
export type DegreeDaysResponse = z.infer<typeof degreeDaysResponseSchema>;

// ---- Stone-fruit check ----

export const stoneFruitSymptoms = ['silver-leaf', 'canker', 'dead-wood'] as const;
export const stoneFruitSymptomSchema = z.enum(stoneFruitSymptoms, { message: 'Choose silver-leaf, canker or dead-wood' });
export const verdicts = ['ok', 'caution', 'avoid'] as const;
export type Verdict = (typeof verdicts)[number];

export const stoneFruitCheckRequestSchema = z.object({
  type: plantTypeCodeSchema,
  date: isoDateSchema,
  latitude: latitudeSchema,
  ageYears: z.number({ message: 'Age must be a number of years' }).min(0, 'Age cannot be negative').max(500, 'Age looks too high').optional(),
  wet: z.boolean({ message: 'Wet must be true or false' }).optional(),
  symptoms: z.array(stoneFruitSymptomSchema).max(stoneFruitSymptoms.length).optional(),
  /** Which published rules to follow; the UK rules unless asked. */
  profile: z.enum(['uk', 'us-north']).optional(),
});
export type StoneFruitCheckRequest = z.input<typeof stoneFruitCheckRequestSchema>;

export const firedRuleSchema = z.object({
  code: z.string(),
  message: z.string(),
  source: z.string(),
  /** How this rule bears on the verdict; "note" informs without changing it. Beyond the contract. */
  effect: z.enum(['ok', 'caution', 'avoid', 'note']).optional(),
});
export type FiredRuleDto = z.infer<typeof firedRuleSchema>;

export const stoneFruitCheckResponseSchema = z.object({
  applies: z.boolean(),
  verdict: z.enum(verdicts),
  rules: z.array(firedRuleSchema),
  nextSafe: z.object({ from: z.string(), to: z.string() }).optional(),
});
export type StoneFruitCheckResponse = z.infer<typeof stoneFruitCheckResponseSchema>;

// ---- Ladder ----

export const ladderRequestSchema = z.object({
  supportHeightM: z.number({ message: 'Give the height as a number of metres' }).gt(0, 'Give a height greater than zero').max(30, 'Give a height of 30 m or less'),
  /** The unit the notes write lengths in; the numbers stay in metres. Beyond the contract. */
  unit: z.enum(['m', 'ft']).optional(),
});
export type LadderRequest = z.input<typeof ladderRequestSchema>;

export const ladderResponseSchema = z.object({
  footDistanceM: z.number(),
  ladderLengthM: z.number(),
  angleDeg: z.number(),
  highestRungNote: z.string(),
  cautions: z.array(z.string()),
});
export type LadderResponse = z.infer<typeof ladderResponseSchema>;

// ---- Care plan ----

export const windowStates = ['upcoming', 'open', 'closing', 'passed'] as const;
export const windowBases = ['readings', 'projection', 'calendar'] as const;

export const seasonSchema = z
  .number({ message: 'The season must be a year such as 2026' })
  .int('The season must be a whole year')
  .min(1800, 'The season must be a year from 1800 to 2200')
  .max(2200, 'The season must be a year from 1800 to 2200');

export const carePlanRequestSchema = z.object({
  type: plantTypeCodeSchema,
  form: plantFormSchema.optional(),
  plantedYear: z.number({ message: 'Planted year must be a year such as 2019' }).int('Planted year must be a whole year').min(1800).max(2200).optional(),
  latitude: latitudeSchema,
  longitude: longitudeSchema,
  season: seasonSchema,
  on: isoDateSchema.optional(),
  /** Daily readings in °C; days outside the season are ignored. */
  days: daysSchema.optional(),
});
export type CarePlanRequest = z.input<typeof carePlanRequestSchema>;

export const careWindowSchema = z.object({
  task: z.string(),
  opens: z.string(),
  closes: z.string(),
  state: z.enum(windowStates),
  basis: z.enum(windowBases),
  source: z.string(),
  reason: z.string(),
});
export type CareWindowDto = z.infer<typeof careWindowSchema>;

export const carePlanResponseSchema = z.object({ windows: z.array(careWindowSchema) });
export type CarePlanResponse = z.infer<typeof carePlanResponseSchema>;

// ---- Daylight ----

// Query strings arrive as text; "" must stay missing rather than become 0 (the equator).
const queryNumber = (schema: z.ZodNumber) =>
  z.preprocess((v) => (typeof v === 'string' && v.trim() !== '' ? Number(v) : v === '' ? undefined : v), schema);

export const daylightQuerySchema = z.object({
  lat: queryNumber(latitudeSchema),
  lon: queryNumber(longitudeSchema),
  date: isoDateSchema.optional(),
  /** An IANA zone for the times' offset; UTC when absent. */
  tz: timeZoneSchema.optional(),
});
export type DaylightQuery = z.input<typeof daylightQuerySchema>;

export const daylightResponseSchema = z.object({
  sunrise: z.string().nullable(),
  sunset: z.string().nullable(),
  civilDusk: z.string().nullable(),
  dayLengthMinutes: z.number(),
  finishLadderWorkBy: z.string().nullable(),
});
export type DaylightResponse = z.infer<typeof daylightResponseSchema>;
