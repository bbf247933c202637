import { z } from 'zod';
import { isoDateSchema } from './common';
import { careWindowSchema, seasonSchema, stoneFruitCheckResponseSchema } from './tools';

// GET /api/groups/:groupId/plants/:plantId/windows — one plant's care windows for a season.

const fromQuery = (v: unknown) => (v === '' ? undefined : typeof v === 'string' && /^\d+$/.test(v) ? Number(v) : v);

export const plantWindowsQuerySchema = z.object({
  season: z.preprocess(fromQuery, seasonSchema.optional()),
  on: z.preprocess((v) => (v === '' ? undefined : v), isoDateSchema.optional()),
});
export type PlantWindowsQuery = z.input<typeof plantWindowsQuerySchema>;

/** The contract's window, plus what the plant page shows: the task in words, a stable key, a how-to line. */
export const plantWindowSchema = careWindowSchema.extend({
  key: z.string(),
  label: z.string(),
  detail: z.string().optional(),
});
export type PlantWindow = z.infer<typeof plantWindowSchema>;

export const plantWindowsSchema = z.object({
  season: z.number(),
  /** The day the states are judged on: today at the site unless the query named one. */
  on: z.string(),
  windows: z.array(plantWindowSchema),
  /** Null where the plant is not stone fruit: the check does not apply. */
  stoneFruitCheck: stoneFruitCheckResponseSchema.nullable(),
  basisNote: z.string(),
});
export type PlantWindows = z.infer<typeof plantWindowsSchema>;
