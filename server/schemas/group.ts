import { z } from 'zod';

export const groupKinds = ['household', 'allotment-society', 'community-orchard', 'market-garden', 'other'] as const;
export const groupKindSchema = z.enum(groupKinds);
export type GroupKind = z.infer<typeof groupKindSchema>;
export const groupKindLabels: Record<GroupKind, string> = {
  household: 'Household',
  'allotment-society': 'Allotment society',
  'community-orchard': 'Community orchard',
  'market-garden': 'Market garden',
  other: 'Other',
};

/** Roles in rising order of what they may do (DESIGN.md §2). */
export const roles = ['viewer', 'helper', 'grower', 'owner'] as const;
export const roleSchema = z.enum(roles);
export type Role = z.infer<typeof roleSchema>;
export const roleRank = (role: Role): number => roles.indexOf(role);

export const groupCreateSchema = z.object({
  name: z.string().trim().min(1, 'Give the group a name').max(100, 'Use at most 100 characters'),
  kind: groupKindSchema,
});
export type GroupCreate = z.infer<typeof groupCreateSchema>;

export const groupUpdateSchema = groupCreateSchema.partial();
export type GroupUpdate = z.infer<typeof groupUpdateSchema>;

export const groupSchema = z.object({
  id: z.string(),
  name: z.string(),
  kind: groupKindSchema,
  role: roleSchema,
  createdAt: z.string(),
});
export type Group = z.infer<typeof groupSchema>;

export const groupParamsSchema = z.object({ groupId: z.uuid({ message: 'Not a valid group id' }) });
