import { z } from 'zod';
import { isoDateSchema } from './common';

// Daily temperatures at a site: /api/groups/:groupId/sites/:siteId/readings and …/weather.
// Temperatures may be sent in °C or °F and are always stored and answered in °C.

export const temperatureUnits = ['C', 'F'] as const;
export const temperatureUnitSchema = z.enum(temperatureUnits, { message: 'Choose °C or °F' });
export type TemperatureUnit = z.infer<typeof temperatureUnitSchema>;

/** Air temperatures outside this band are instrument faults or typing slips, not weather. */
export const READING_LIMIT_C = 60;
/** The upload's size limit; the client says it before the person picks a file. */
export const UPLOAD_LIMIT_BYTES = 5 * 1024 * 1024;

export const readingSources = ['upload', 'manual', 'station'] as const;
export type ReadingSource = (typeof readingSources)[number];

export const toCelsius = (value: number, unit: TemperatureUnit): number => (unit === 'F' ? ((value - 32) * 5) / 9 : value);
/** Two decimals keep a tenth of a °F (0.056 °C) while dropping float noise from the conversion. */
export const roundTemperature = (value: number): number => Math.round(value * 100) / 100;

export const readingSchema = z.object({
  date: z.string(),
  tminC: z.number(),
  tmaxC: z.number(),
  rainMm: z.number().nullable(),
  source: z.enum(readingSources),
});
export type Reading = z.infer<typeof readingSchema>;

export const readingListSchema = z.object({ items: z.array(readingSchema), latestReading: z.string().nullable() });
export type ReadingList = z.infer<typeof readingListSchema>;

export const readingListQuerySchema = z.object({
  from: z.preprocess((v) => (v === '' ? undefined : v), isoDateSchema.optional()),
  to: z.preprocess((v) => (v === '' ? undefined : v), isoDateSchema.optional()),
}).refine((q) => !q.from || !q.to || q.from <= q.to, { message: 'The first date must not be after the last', path: ['from'] });

const temperature = (what: string) => z.number({ message: `Give the ${what} temperature as a number` });

// A day typed in by hand. The range check runs after conversion, so −76 °F and 140 °F are the limits in °F.
const readingFields = z.object({
  tmin: temperature('minimum'),
  tmax: temperature('maximum'),
  rainMm: z.number({ message: 'Rain must be a number of millimetres' }).min(0, 'Rain cannot be below 0 mm').max(2000, 'Rain looks too high').nullable().optional(),
  unit: temperatureUnitSchema.default('C'),
});

function checkDay(day: { tmin: number; tmax: number; unit: TemperatureUnit }, ctx: z.RefinementCtx): void {
  const unit = `°${day.unit}`;
  for (const key of ['tmin', 'tmax'] as const) {
    const c = toCelsius(day[key], day.unit);
    if (Math.abs(c) > READING_LIMIT_C) ctx.addIssue({ code: 'custom', path: [key], message: `${day[key]} ${unit} is outside −60…60 °C` });
  }
  if (day.tmin > day.tmax) ctx.addIssue({ code: 'custom', path: ['tmin'], message: `The minimum (${day.tmin} ${unit}) is above the maximum (${day.tmax} ${unit})` });
}

export const readingUpdateSchema = readingFields.superRefine(checkDay);
export type ReadingUpdate = z.input<typeof readingUpdateSchema>;

export const readingCreateSchema = readingFields.extend({ date: isoDateSchema }).superRefine(checkDay);
export type ReadingCreate = z.input<typeof readingCreateSchema>;

export const readingDateParamsSchema = z.object({ date: isoDateSchema }).loose();

// ---- CSV upload ----

export const dateOrders = ['auto', 'ymd', 'dmy', 'mdy'] as const;
export type DateOrder = (typeof dateOrders)[number];
export const onExistingChoices = ['skip', 'replace'] as const;
export type OnExisting = (typeof onExistingChoices)[number];

const columnIndex = z.number().int().min(0).max(199);

/** Which column holds what: indexes into the file's header row. */
export const columnMappingSchema = z.object({
  date: columnIndex,
  tmin: columnIndex,
  tmax: columnIndex,
  rain: columnIndex.nullable(),
});
export type ColumnMapping = z.infer<typeof columnMappingSchema>;

/** Sent as a JSON text field named `options` beside the file; every part may be left out for the preview. */
export const uploadOptionsSchema = z.object({
  mapping: columnMappingSchema.optional(),
  unit: temperatureUnitSchema.optional(),
  dateOrder: z.enum(dateOrders).default('auto'),
  onExisting: z.enum(onExistingChoices, { message: 'Choose skip or replace' }).default('skip'),
});
export type UploadOptions = z.input<typeof uploadOptionsSchema>;

export const uploadRowSchema = z.object({
  /** The line of the file, header = 1, as a spreadsheet numbers it. */
  row: z.number(),
  date: z.string().nullable(),
  tminC: z.number().nullable(),
  tmaxC: z.number().nullable(),
  rainMm: z.number().nullable(),
  isStored: z.boolean(),
  errors: z.array(z.string()),
});
export type UploadRow = z.infer<typeof uploadRowSchema>;

export const uploadPreviewSchema = z.object({
  /** The header row's names (or "Column 1"… when the file has none), each with a value from the first row. */
  columns: z.array(z.object({ name: z.string(), example: z.string() })),
  /** What still needs choosing before rows can be read, e.g. "Choose the column with the minimum". */
  mappingProblems: z.array(z.string()),
  mapping: z.object({ date: z.number().nullable(), tmin: z.number().nullable(), tmax: z.number().nullable(), rain: z.number().nullable() }),
  unit: temperatureUnitSchema,
  /** Why that unit was chosen, in words ("the header says °F"). */
  unitNote: z.string(),
  dateOrder: z.enum(['ymd', 'dmy', 'mdy']),
  dateNote: z.string(),
  onExisting: z.enum(onExistingChoices),
  /** The first rows and every row with a problem (at most 200), in file order. */
  rows: z.array(uploadRowSchema),
  totals: z.object({ rows: z.number(), valid: z.number(), withErrors: z.number(), alreadyStored: z.number() }),
  firstDate: z.string().nullable(),
  lastDate: z.string().nullable(),
});
export type UploadPreview = z.infer<typeof uploadPreviewSchema>;

export const uploadResultSchema = z.object({
  added: z.number(),
  replaced: z.number(),
  skipped: z.number(),
  firstDate: z.string(),
  lastDate: z.string(),
  latestReading: z.string().nullable(),
});
export type UploadResult = z.infer<typeof uploadResultSchema>;
