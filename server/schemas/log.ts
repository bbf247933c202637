import { z } from 'zod';
import { plantTypeCodeSchema } from './catalogue';
import { isoDateSchema, uuidSchema } from './common';
import { firedRuleSchema, verdicts } from './tools';

// The work log's contract (routes/README.md): what was done, to which plants, when and by whom.
// Each kind carries its own details; the client builds its log form on these same schemas.

export const logKinds = ['prune', 'feed', 'mulch', 'thin', 'pinch', 'leaf-pick', 'harvest', 'spray', 'water', 'note'] as const;
export const logKindSchema = z.enum(logKinds, { message: 'Choose what was done' });
export type LogKind = z.infer<typeof logKindSchema>;

export const logKindLabels: Record<LogKind, string> = {
  prune: 'Prune', feed: 'Feed', mulch: 'Mulch', thin: 'Thin fruit', pinch: 'Pinch laterals',
  'leaf-pick': 'Pick vine leaves', harvest: 'Harvest', spray: 'Spray', water: 'Water', note: 'Note',
};

export const pruneTypes = ['winter', 'summer', 'formative', 'remedial'] as const;
export const pruneTypeLabels: Record<(typeof pruneTypes)[number], string> = {
  winter: 'Winter', summer: 'Summer', formative: 'Formative (shaping)', remedial: 'Remedial (dead or diseased wood)',
};

export const feedUnits = ['g', 'kg', 'ml', 'l'] as const;
export type FeedUnit = (typeof feedUnits)[number];

// The usual sizes a cook asks for; 10–15 cm is the common picking size (care-rules.md §4.5).
export const leafSizeBands = ['under-10', '10-15', 'over-15'] as const;
export const leafSizeBandLabels: Record<(typeof leafSizeBands)[number], string> = {
  'under-10': 'Under 10 cm', '10-15': '10–15 cm', 'over-15': 'Over 15 cm',
};

const num = (what: string) => z.number({ message: `${what} must be a number` });
const percent = (what: string) => num(what).min(0, `${what} runs from 0 to 100`).max(100, `${what} runs from 0 to 100`);
const text = (max: number, required?: string) =>
  required ? z.string().trim().min(1, required).max(max, `Use at most ${max} characters`) : z.string().trim().max(max, `Use at most ${max} characters`);

export const logDetailsSchemas = {
  prune: z.object({ pruneType: z.enum(pruneTypes, { message: 'Choose winter, summer, formative or remedial' }) }),
  feed: z.object({
    product: text(100, 'Name the feed, e.g. Growmore'),
    // Percentages by weight as printed on the bag: N, then P as P2O5, then K as K2O.
    npk: z.object({ n: percent('N'), p: percent('P'), k: percent('K') }).nullable().default(null),
    amount: num('The amount').gt(0, 'The amount must be more than 0').max(100_000, 'The amount looks too large'),
    unit: z.enum(feedUnits, { message: 'Choose g, kg, ml or l' }),
    areaM2: num('The area').gt(0, 'The area must be more than 0 m²').max(10_000, 'The area looks too large').nullable().default(null),
  }),
  mulch: z.object({ material: text(100).default('') }),
  thin: z.object({
    fruitsPerCluster: num('Fruits per cluster').int('Give a whole number').min(0).max(20, 'That is a lot per cluster').nullable().default(null),
    spacingCm: num('The spacing').gt(0, 'The spacing must be more than 0 cm').max(200, 'The spacing looks too wide').nullable().default(null),
  }),
  pinch: z.object({}),
  'leaf-pick': z.object({
    leafCount: num('The leaf count').int('Give a whole number of leaves').min(1, 'Count at least one leaf').max(10_000),
    sizeBand: z.enum(leafSizeBands, { message: 'Choose a leaf size' }),
  }),
  harvest: z.object({
    weightKg: num('The weight').gt(0, 'The weight must be more than 0 kg').max(10_000, 'The weight looks too large').nullable().default(null),
    count: num('The count').int('Give a whole number').min(1, 'Count at least one').max(1_000_000).nullable().default(null),
  }).refine((h) => h.weightKg !== null || h.count !== null, { message: 'Give the weight, the count or both', path: ['weightKg'] }),
  spray: z.object({
    product: text(100, 'Name what was sprayed'),
    // The label's harvest interval: days from spraying before the crop may be picked.
    harvestIntervalDays: num('The harvest interval').int('Give whole days').min(0, 'The interval cannot be negative').max(365, 'The interval looks too long'),
  }),
  water: z.object({ litres: num('The amount of water').gt(0).max(100_000).nullable().default(null) }),
  note: z.object({}),
} satisfies Record<LogKind, z.ZodType>;

export type LogDetails = { [K in LogKind]: z.output<(typeof logDetailsSchemas)[K]> };

const common = {
  doneOn: isoDateSchema,
  /** Who did the work; the caller when left out. Only growers and owners may name someone else. */
  doneBy: uuidSchema.optional(),
  plantIds: z.array(uuidSchema, { message: 'Choose at least one plant' }).min(1, 'Choose at least one plant').max(100, 'Log at most 100 plants at once')
    .refine((ids) => new Set(ids).size === ids.length, 'A plant is listed twice'),
  notes: text(2000).default(''),
  /** Why a cut the stone-fruit check says to avoid was made all the same. */
  overrideReason: z.preprocess((v) => (typeof v === 'string' && v.trim() === '' ? undefined : v), text(500).optional()),
};

const option = <K extends LogKind>(kind: K) => z.object({ ...common, kind: z.literal(kind), details: logDetailsSchemas[kind] });

export const logEntryCreateSchema = z.discriminatedUnion('kind', [
  option('prune'), option('feed'), option('mulch'), option('thin'), option('pinch'),
  option('leaf-pick'), option('harvest'), option('spray'), option('water'),
  // A note with no words says nothing: it needs its text.
  option('note').extend({ notes: text(2000, 'Write the note') }),
], { message: 'Choose what was done' });
export type LogEntryCreate = z.input<typeof logEntryCreateSchema>;
export type LogEntryInput = z.output<typeof logEntryCreateSchema>;

// ---- Answers ----

export const guardSchema = z.object({ verdict: z.enum(verdicts), rules: z.array(firedRuleSchema) });
export type Guard = z.infer<typeof guardSchema>;

export const personRefSchema = z.object({ id: z.string(), name: z.string() }).nullable();

export const photoSchema = z.object({
  id: z.string(),
  contentType: z.string(),
  url: z.string(),
  thumbUrl: z.string(),
  uploadedBy: personRefSchema,
  createdAt: z.string(),
});
export type Photo = z.infer<typeof photoSchema>;

export const logEntrySchema = z.object({
  id: z.string(),
  kind: logKindSchema,
  details: z.record(z.string(), z.unknown()),
  summary: z.string(),
  doneOn: z.string(),
  doneBy: personRefSchema,
  recordedBy: personRefSchema,
  notes: z.string(),
  overrideReason: z.string().nullable(),
  /** Spray only: picking is unsafe before this day. */
  pickingSafeFrom: z.string().nullable(),
  plants: z.array(z.object({
    id: z.string(), name: z.string(), typeCode: plantTypeCodeSchema, siteId: z.string(), siteName: z.string(), guard: guardSchema.nullable(),
  })),
  windowsDone: z.array(z.object({ id: z.string(), plantId: z.string(), task: z.string(), label: z.string() })),
  photos: z.array(photoSchema),
  createdAt: z.string(),
});
export type LogEntry = z.infer<typeof logEntrySchema>;

export const logListQuerySchema = z.object({
  plantId: z.preprocess((v) => (v === '' ? undefined : v), uuidSchema.optional()),
  siteId: z.preprocess((v) => (v === '' ? undefined : v), uuidSchema.optional()),
  kind: z.preprocess((v) => (v === '' ? undefined : v), logKindSchema.optional()),
  personId: z.preprocess((v) => (v === '' ? undefined : v), uuidSchema.optional()),
  from: z.preprocess((v) => (v === '' ? undefined : v), isoDateSchema.optional()),
  to: z.preprocess((v) => (v === '' ? undefined : v), isoDateSchema.optional()),
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(25),
}).refine((q) => !q.from || !q.to || q.from <= q.to, { message: 'The first day comes after the last', path: ['from'] });
export type LogListQuery = z.input<typeof logListQuerySchema>;

export const logListSchema = z.object({ items: z.array(logEntrySchema), total: z.number(), page: z.number(), pageSize: z.number() });
export type LogList = z.infer<typeof logListSchema>;

/** The form asks before saving what the stone-fruit check says about cutting these plants that day. */
export const logGuardQuerySchema = z.object({
  date: isoDateSchema,
  plantIds: z.preprocess((v) => (typeof v === 'string' ? v.split(',').filter(Boolean) : v), z.array(uuidSchema).min(1).max(100)),
});

export const logGuardSchema = z.object({
  verdict: z.enum(verdicts).nullable(),
  plants: z.array(z.object({ id: z.string(), name: z.string(), guard: guardSchema, nextSafe: z.object({ from: z.string(), to: z.string() }).optional() })),
});
export type LogGuard = z.infer<typeof logGuardSchema>;

export const logEntryParamsSchema = z.object({ entryId: z.uuid({ message: 'Not a valid log entry id' }) }).loose();
