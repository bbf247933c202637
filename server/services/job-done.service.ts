import { monthOf, todayIn } from '../care';
import { sequelize } from '../db';
import { conflict, forbidden, fromZodError, validationFailed } from '../lib/errors';
import { roleRank, type Role } from '../schemas/group';
import { logEntryCreateSchema, type LogEntry, type pruneTypes } from '../schemas/log';
import { jobLogKind, type jobDoneSchema } from '../schemas/team';
import type { z } from 'zod';
import { lockWindow } from './job.service';
import { createLogEntry } from './log.service';

// Ticking off a job is logging the work: one log entry for the window's plant, marking exactly that
// window done, written in the same transaction that checked the job was the caller's to tick.

type PruneType = (typeof pruneTypes)[number];
const pruneTypeOf: Record<string, PruneType> = {
  'winter-prune': 'winter', 'summer-prune': 'summer', 'stone-fruit-prune': 'summer', 'formative-prune': 'formative', 'remedial-cut': 'remedial',
};

// Kinds whose details the person gives (a feed's product and amount…) take them as sent; the
// others are filled in from the task, so a tick needs no more than a date.
function detailsFor(task: string, date: string, given: Record<string, unknown>): Record<string, unknown> {
  switch (jobLogKind(task)) {
    // Old canes come out after picking in summer, or in late winter for autumn raspberries.
    case 'prune': return { pruneType: pruneTypeOf[task] ?? (monthOf(date) >= 4 && monthOf(date) <= 10 ? 'summer' : 'winter') };
    case 'mulch': return { material: typeof given.material === 'string' ? given.material : '' };
    case 'thin': case 'pinch': case 'note': return {};
    default: return given;
  }
}

const TASK_NOTES: Record<string, string> = { 'tying-in': 'Tied in new shoots' };

export async function completeJob(groupId: string, userId: string, role: Role, windowId: string, input: z.output<typeof jobDoneSchema>): Promise<LogEntry> {
  return sequelize.transaction(async (transaction) => {
    const window = await lockWindow(groupId, windowId, transaction);
    if (roleRank(role) < roleRank('grower') && window.assignedTo !== userId) throw forbidden('This job is not handed to you; ask a grower or owner to hand it over');
    if (window.doneAt) throw conflict('This job is already done');
    const { date } = input;
    if (date > todayIn(window.timeZone)) throw validationFailed([{ path: 'date', message: 'The date cannot be after today' }]);
    const kind = jobLogKind(window.task);
    const parsed = logEntryCreateSchema.safeParse({
      kind, doneOn: date, plantIds: [window.plantId], notes: input.notes || TASK_NOTES[window.task] || '',
      details: detailsFor(window.task, date, input.details), overrideReason: input.overrideReason,
    });
    if (!parsed.success) throw fromZodError(parsed.error);
    return createLogEntry(groupId, userId, parsed.data, { role, transaction, windowIds: [windowId] });
  });
}
