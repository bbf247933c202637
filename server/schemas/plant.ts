import { z } from 'zod';
import { healthFlagSchema, plantFormSchema, plantTypeCodeSchema } from './catalogue';
import { optionalText } from './common';

const thisYear = () => new Date().getUTCFullYear();

const plantFields = {
  siteId: z.uuid({ message: 'Choose a site' }),
  typeCode: plantTypeCodeSchema,
  cultivar: z.string().trim().max(100, 'Use at most 100 characters'),
  rootstock: z.string().trim().max(60, 'Use at most 60 characters'),
  form: plantFormSchema,
  plantedYear: z
    .number({ message: 'Planted year must be a year such as 2019' })
    .int('Planted year must be a whole year')
    .min(1800, 'Planted year looks too early')
    .refine((y) => y <= thisYear(), 'Planted year cannot be in the future')
    .nullable()
    .optional(),
  heightM: z
    .number({ message: 'Height must be a number of metres' })
    .gt(0, 'Height must be more than 0 m')
    .max(30, 'Height must be 30 m or less')
    .nullable()
    .optional(),
  positionLabel: z.string().trim().max(100, 'Use at most 100 characters'),
  healthFlags: z.array(healthFlagSchema).max(10),
  notes: z.string().trim().max(2000, 'Use at most 2,000 characters'),
};

// Defaults belong to creation only: on an update a missing field means "leave it as it is".
export const plantCreateSchema = z.object({
  ...plantFields,
  cultivar: plantFields.cultivar.default(''),
  rootstock: plantFields.rootstock.default(''),
  positionLabel: plantFields.positionLabel.default(''),
  healthFlags: plantFields.healthFlags.default([]),
  notes: plantFields.notes.default(''),
});
export type PlantCreate = z.input<typeof plantCreateSchema>;

export const plantUpdateSchema = z.object(plantFields).partial();
export type PlantUpdate = z.input<typeof plantUpdateSchema>;

export const plantSchema = z.object({
  id: z.string(),
  groupId: z.string(),
  siteId: z.string(),
  siteName: z.string(),
  typeCode: plantTypeCodeSchema,
  cultivar: z.string(),
  rootstock: z.string(),
  form: plantFormSchema,
  plantedYear: z.number().nullable(),
  heightM: z.number().nullable(),
  positionLabel: z.string(),
  healthFlags: z.array(healthFlagSchema),
  notes: z.string(),
  archivedAt: z.string().nullable(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Plant = z.infer<typeof plantSchema>;

export const plantSortFields = ['cultivar', 'typeCode', 'siteName', 'plantedYear', 'heightM', 'positionLabel', 'createdAt'] as const;

export const plantListQuerySchema = z.object({
  search: optionalText.pipe(z.string().max(100).optional()),
  siteId: z.preprocess((v) => (v === '' ? undefined : v), z.uuid({ message: 'Not a valid site id' }).optional()),
  typeCode: z.preprocess((v) => (v === '' ? undefined : v), plantTypeCodeSchema.optional()),
  includeArchived: z.enum(['true', 'false']).optional().transform((v) => v === 'true'),
  sort: z.enum(plantSortFields).default('cultivar'),
  order: z.enum(['asc', 'desc']).default('asc'),
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(200).default(25),
});
export type PlantListQuery = z.input<typeof plantListQuerySchema>;

export const plantListSchema = z.object({
  items: z.array(plantSchema),
  total: z.number(),
  page: z.number(),
  pageSize: z.number(),
});
export type PlantList = z.infer<typeof plantListSchema>;
