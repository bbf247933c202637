import { z } from 'zod';
import { latitudeSchema, longitudeSchema, timeZoneSchema } from './common';

export const siteHazards = ['overhead-lines', 'sloping-ground', 'soft-ground', 'road-or-path', 'greenhouse-or-roof'] as const;
export const siteHazardSchema = z.enum(siteHazards);
export type SiteHazard = z.infer<typeof siteHazardSchema>;
export const siteHazardLabels: Record<SiteHazard, string> = {
  'overhead-lines': 'Overhead power or phone lines',
  'sloping-ground': 'Sloping ground',
  'soft-ground': 'Soft ground',
  'road-or-path': 'Branches over a road or path',
  'greenhouse-or-roof': 'Branches over a greenhouse or roof',
};

const siteFields = {
  name: z.string().trim().min(1, 'Give the site a name').max(100, 'Use at most 100 characters'),
  latitude: latitudeSchema,
  longitude: longitudeSchema,
  elevationM: z.number({ message: 'Elevation must be a number of metres' }).min(-430, 'Elevation looks too low').max(5000, 'Elevation looks too high').nullable().optional(),
  timeZone: timeZoneSchema,
  hazards: z.array(siteHazardSchema).max(siteHazards.length),
  notes: z.string().trim().max(2000, 'Use at most 2,000 characters'),
};

// Defaults belong to creation only: on an update a missing field means "leave it as it is".
export const siteCreateSchema = z.object({ ...siteFields, hazards: siteFields.hazards.default([]), notes: siteFields.notes.default('') });
export type SiteCreate = z.input<typeof siteCreateSchema>;

export const siteUpdateSchema = z.object(siteFields).partial();
export type SiteUpdate = z.input<typeof siteUpdateSchema>;

export const siteSchema = z.object({
  id: z.string(),
  groupId: z.string(),
  name: z.string(),
  latitude: z.number(),
  longitude: z.number(),
  elevationM: z.number().nullable(),
  timeZone: z.string(),
  hemisphere: z.enum(['north', 'south']),
  hazards: z.array(siteHazardSchema),
  notes: z.string(),
  plantCount: z.number(),
  archivedAt: z.string().nullable(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Site = z.infer<typeof siteSchema>;

export const siteListQuerySchema = z.object({
  includeArchived: z.enum(['true', 'false']).optional().transform((v) => v === 'true'),
});
