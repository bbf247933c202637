import { z } from 'zod';
import { registerSchema } from './auth';
import { isoDateSchema } from './common';
import { roleSchema } from './group';
import type { LogKind } from './log';

// The team: invitations, members and their roles, jobs handed to people, and who did what.

export const INVITATION_DAYS = 7;

export const invitationCreateSchema = z.object({
  email: registerSchema.shape.email,
  role: roleSchema,
});
export type InvitationCreate = z.infer<typeof invitationCreateSchema>;

export const invitationSchema = z.object({
  id: z.string(),
  email: z.string(),
  role: roleSchema,
  invitedByName: z.string().nullable(),
  expiresAt: z.string(),
  createdAt: z.string(),
});
export type Invitation = z.infer<typeof invitationSchema>;

/** What the invitation page shows before accepting: whose group, which role, for which address. */
export const invitationPreviewSchema = z.object({
  groupName: z.string(),
  role: roleSchema,
  email: z.string(),
  invitedByName: z.string().nullable(),
  expiresAt: z.string(),
  hasAccount: z.boolean(),
});
export type InvitationPreview = z.infer<typeof invitationPreviewSchema>;

export const invitationTokenSchema = z.object({ token: z.string().min(20, 'This invitation link is incomplete').max(200) });

/** Signed in: an empty body joins the signed-in account. Signed out: a name and password make one. */
export const invitationAcceptSchema = z.object({
  name: registerSchema.shape.name.optional(),
  password: registerSchema.shape.password.optional(),
});
export type InvitationAccept = z.infer<typeof invitationAcceptSchema>;

export const invitationAcceptedSchema = z.object({ groupId: z.string(), groupName: z.string(), role: roleSchema });
export type InvitationAccepted = z.infer<typeof invitationAcceptedSchema>;

export const memberSchema = z.object({ userId: z.string(), name: z.string(), email: z.string(), role: roleSchema, joinedAt: z.string() });
export type Member = z.infer<typeof memberSchema>;

export const memberParamsSchema = z.object({ userId: z.uuid({ message: 'Not a valid person id' }) }).loose();
export const memberRoleSchema = z.object({ role: roleSchema });
export type MemberRole = z.infer<typeof memberRoleSchema>;

// ---- Jobs ----

// Window ids are hashes in UUID form (care_window_id() in the database), without a UUID version.
export const windowParamsSchema = z.object({ windowId: z.guid({ message: 'Not a valid job id' }) }).loose();

/** Hand a window to a person, or take it back (null). */
export const assignmentSchema = z.object({ userId: z.uuid({ message: 'Choose a person' }).nullable() });
export type Assignment = z.infer<typeof assignmentSchema>;

export const jobStates = ['upcoming', 'open', 'closing', 'passed'] as const;

export const jobSchema = z.object({
  windowId: z.string(),
  plantId: z.string(),
  plantName: z.string(),
  typeCode: z.string(),
  siteName: z.string(),
  positionLabel: z.string(),
  task: z.string(),
  opens: z.string(),
  closes: z.string(),
  state: z.enum(jobStates),
  assignedTo: z.object({ userId: z.string(), name: z.string() }).nullable(),
  doneAt: z.string().nullable(),
});
export type Job = z.infer<typeof jobSchema>;

export const jobListSchema = z.object({
  today: z.string(),
  /** Windows handed to the caller and not done yet, soonest closing first. */
  mine: z.array(jobSchema),
  /** Growers and owners: every window open at some point in the next seven days, not done. Empty for others. */
  week: z.array(jobSchema),
});
export type JobList = z.infer<typeof jobListSchema>;

/** What ticking off a window logs: the log kind for each task (the care engine's task codes). */
export const jobLogKinds: Record<string, LogKind> = {
  'winter-prune': 'prune', 'summer-prune': 'prune', 'formative-prune': 'prune', 'stone-fruit-prune': 'prune', 'remedial-cut': 'prune', 'cane-cutting-out': 'prune',
  'spring-feed': 'feed', 'fruiting-feed': 'feed', mulch: 'mulch', 'fruit-thinning': 'thin', 'bunch-thinning': 'thin',
  'lateral-pinching': 'pinch', 'leaf-picking': 'leaf-pick', harvest: 'harvest', 'tying-in': 'note',
};
export const jobLogKind = (task: string): LogKind => jobLogKinds[task] ?? 'note';

/**
 * Ticking a job off logs the work (server/schemas/log.ts): the kind follows from the window's task;
 * `details` are that kind's details (a feed's product, amount and unit, say). `overrideReason` is
 * asked for when the stone-fruit check says to avoid a cut on that day.
 */
export const jobDoneSchema = z.object({
  date: isoDateSchema,
  notes: z.string().trim().max(2000, 'Use at most 2,000 characters').default(''),
  details: z.record(z.string(), z.unknown()).default({}),
  overrideReason: z.string().trim().max(500, 'Use at most 500 characters').optional(),
});
export type JobDone = z.input<typeof jobDoneSchema>;

// ---- Who did what ----

export const seasonQuerySchema = z.object({
  season: z.preprocess((v) => (v === '' || v === undefined ? undefined : Number(v)), z.number().int().min(2000).max(2100).optional()),
});

export const seasonWorkSchema = z.object({
  season: z.number(),
  people: z.array(z.object({ userId: z.string().nullable(), name: z.string(), total: z.number(), byKind: z.record(z.string(), z.number()) })),
  entries: z.array(z.object({ id: z.string(), date: z.string(), kind: z.string(), personName: z.string(), plantNames: z.array(z.string()) })),
});
export type SeasonWork = z.infer<typeof seasonWorkSchema>;
