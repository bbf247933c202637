import { z } from 'zod';
import { isoDateSchema } from './common';

// Stored produce under /api/groups/:groupId/store: the API's contract.

export const storeItems = ['vine-leaves', 'apples', 'pears', 'stone-fruit', 'soft-fruit', 'figs', 'grapes', 'other'] as const;
export const storeItemSchema = z.enum(storeItems, { message: 'Choose what was stored' });
export type StoreItem = z.infer<typeof storeItemSchema>;
export const storeItemLabels: Record<StoreItem, string> = {
  'vine-leaves': 'Vine leaves',
  apples: 'Apples',
  pears: 'Pears',
  'stone-fruit': 'Plums, cherries and other stone fruit',
  'soft-fruit': 'Currants, berries and cane fruit',
  figs: 'Figs',
  grapes: 'Grapes',
  other: 'Something else',
};

export const storeMethods = ['frozen', 'dried', 'bottled', 'other'] as const;
export const storeMethodSchema = z.enum(storeMethods, { message: 'Choose how it was stored' });
export type StoreMethod = z.infer<typeof storeMethodSchema>;
export const storeMethodLabels: Record<StoreMethod, string> = { frozen: 'Frozen', dried: 'Dried', bottled: 'Bottled', other: 'Other' };

export const storeUnits = ['count', 'leaves', 'g', 'kg', 'jars', 'bags', 'litres'] as const;
export const storeUnitSchema = z.enum(storeUnits, { message: 'Choose a unit' });
export type StoreUnit = z.infer<typeof storeUnitSchema>;
export const storeUnitLabels: Record<StoreUnit, string> = { count: 'pieces', leaves: 'leaves', g: 'g', kg: 'kg', jars: 'jars', bags: 'bags', litres: 'litres' };

/** A batch's standing on a day: word and colour in the client, the same words everywhere. */
export const storeStates = ['keeps', 'use-soon', 'past-use-by', 'used'] as const;
export type StoreState = (typeof storeStates)[number];
export const storeStateLabels: Record<StoreState, string> = { keeps: 'Keeps', 'use-soon': 'Use soon', 'past-use-by': 'Past use-by', used: 'Used' };

export const storeBatchCreateSchema = z.object({
  item: storeItemSchema,
  label: z.string().trim().max(100, 'Use at most 100 characters').default(''),
  plantIds: z.array(z.uuid({ message: 'Not a valid plant id' })).max(50, 'Choose at most 50 plants').default([]),
  quantity: z.number({ message: 'Say how much, as a number' }).gt(0, 'Say how much was stored').max(100_000, 'That is more than a store holds'),
  unit: storeUnitSchema,
  method: storeMethodSchema,
  storedOn: isoDateSchema,
  notes: z.string().trim().max(1000, 'Use at most 1,000 characters').default(''),
});
export type StoreBatchCreate = z.input<typeof storeBatchCreateSchema>;

/** Mark a batch used (a date) or put it back in store (null). */
export const storeBatchUseSchema = z.object({ usedOn: isoDateSchema.nullable() });
export type StoreBatchUse = z.infer<typeof storeBatchUseSchema>;

export const storeListQuerySchema = z.object({
  includeUsed: z.enum(['true', 'false']).optional().transform((v) => v === 'true'),
});

export const storeBatchSchema = z.object({
  id: z.string(),
  item: storeItemSchema,
  label: z.string(),
  plants: z.array(z.object({ id: z.string(), name: z.string() })),
  quantity: z.number(),
  unit: storeUnitSchema,
  method: storeMethodSchema,
  storedOn: z.string(),
  warnOn: z.string(),
  useBy: z.string(),
  keepSource: z.string(),
  notes: z.string(),
  usedOn: z.string().nullable(),
  usedByName: z.string().nullable(),
  storedByName: z.string().nullable(),
  state: z.enum(storeStates),
});
export type StoreBatch = z.infer<typeof storeBatchSchema>;

export const keepTimeSchema = z.object({
  item: storeItemSchema, method: storeMethodSchema, warnMonths: z.number(), expireMonths: z.number(), source: z.string(), note: z.string(),
});
export type KeepTime = z.infer<typeof keepTimeSchema>;

export const storeListSchema = z.object({ today: z.string(), batches: z.array(storeBatchSchema), keepTimes: z.array(keepTimeSchema) });
export type StoreList = z.infer<typeof storeListSchema>;
