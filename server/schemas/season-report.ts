import { z } from 'zod';
import { seasonSchema } from './tools';
import { uuidSchema } from './common';

// The printable season report of one site: what was fed, cut, picked and stored there in a season.

export const seasonReportQuerySchema = z.object({
  siteId: uuidSchema,
  season: z.coerce.number().pipe(seasonSchema).optional(),
});

const nutrients = z.object({ nG: z.number(), p2o5G: z.number(), k2oG: z.number() });
export type Nutrients = z.infer<typeof nutrients>;

export const seasonReportSchema = z.object({
  site: z.object({ id: z.string(), name: z.string() }),
  season: z.number(),
  from: z.string(),
  to: z.string(),
  feeds: z.array(z.object({
    plantId: z.string(),
    plantName: z.string(),
    applications: z.array(z.object({
      entryId: z.string(), doneOn: z.string(), product: z.string(), npk: z.string().nullable(),
      /** This plant's share of the entry's amount (shared equally among its plants), in the entry's unit. */
      share: z.number(), unit: z.string(), nutrients: nutrients.nullable(),
    })),
    /** Grams of N, P2O5 and K2O from every application that could be counted; null when none could. */
    totals: nutrients.nullable(),
    uncounted: z.number(),
  })),
  prunes: z.array(z.object({
    entryId: z.string(), doneOn: z.string(), plantName: z.string(), pruneType: z.string(),
    verdict: z.enum(['ok', 'caution', 'avoid']).nullable(), overrideReason: z.string().nullable(), doneBy: z.string().nullable(),
  })),
  harvests: z.array(z.object({ plantId: z.string(), plantName: z.string(), weightKg: z.number(), count: z.number(), picks: z.number() })),
  leaves: z.array(z.object({ plantId: z.string(), plantName: z.string(), leafCount: z.number(), picks: z.number(), sizeBands: z.array(z.string()) })),
  /** Batches stored in the season from at least one plant at this site. */
  stored: z.array(z.object({
    batchId: z.string(), item: z.string(), label: z.string(), quantity: z.number(), unit: z.string(), method: z.string(),
    storedOn: z.string(), useBy: z.string(), usedOn: z.string().nullable(), plantNames: z.array(z.string()),
  })),
});
export type SeasonReport = z.infer<typeof seasonReportSchema>;
