import { Op, QueryTypes, type Transaction } from 'sequelize';
import { daysBetween, type TaskCode } from '../care';
import { sequelize } from '../db';
import { validationFailed } from '../lib/errors';
import { CareWindow, LogEntryWindow } from '../models';
import type { LogEntryInput } from '../schemas/log';
import type { LogPlant } from './log-plants.service';
import { seasonContaining } from './plant-windows.service';

// "An entry counts for the matching window of each of its plants" (issue 6): the window of the same
// plant whose task the entry's kind does, holding the entry's day — or, when none holds it, the
// nearest such window of that season (a feed a few days early still counts). A done window gets no
// more "closing" reminders (worker/pass/decide-reminders.ts skips done_at IS NOT NULL).

const pruneTasks: Record<string, TaskCode[]> = {
  winter: ['winter-prune', 'cane-cutting-out'],
  summer: ['summer-prune', 'stone-fruit-prune', 'cane-cutting-out'],
  formative: ['formative-prune'],
  remedial: ['remedial-cut'],
};

export function tasksFor(input: LogEntryInput): TaskCode[] {
  switch (input.kind) {
    case 'prune': return pruneTasks[input.details.pruneType] ?? [];
    case 'feed': return ['spring-feed', 'fruiting-feed'];
    case 'mulch': return ['mulch'];
    case 'thin': return ['fruit-thinning', 'bunch-thinning'];
    case 'pinch': return ['lateral-pinching'];
    case 'leaf-pick': return ['leaf-picking'];
    case 'harvest': return ['harvest'];
    default: return [];
  }
}

const distance = (w: CareWindow, day: string) => (day < w.opens ? daysBetween(day, w.opens) : day > w.closes ? daysBetween(w.closes, day) : 0);

function pickWindows(windows: CareWindow[], plant: LogPlant, day: string): CareWindow[] {
  const mine = windows.filter((w) => w.plantId === plant.id);
  const holding = mine.filter((w) => w.opens <= day && day <= w.closes);
  if (holding.length) return holding;
  const season = seasonContaining(day, plant.latitude);
  const nearest = mine.filter((w) => w.season === season).sort((a, b) => distance(a, day) - distance(b, day))[0];
  return nearest ? [nearest] : [];
}

/** Marks the windows the entry counts for and remembers them; `explicit` ids (a ticked-off job) win. */
export async function markWindowsDone(entryId: string, groupId: string, input: LogEntryInput, doneBy: string, plants: LogPlant[], t: Transaction, explicit?: string[]): Promise<void> {
  let chosen: CareWindow[];
  if (explicit?.length) {
    chosen = await CareWindow.findAll({ where: { id: explicit, groupId, plantId: plants.map((p) => p.id) }, transaction: t });
    if (chosen.length !== new Set(explicit).size) throw validationFailed([{ path: 'windowIds', message: 'Choose care windows of the plants logged' }]);
  } else {
    const tasks = tasksFor(input);
    if (!tasks.length) return;
    const open = await CareWindow.findAll({ where: { groupId, plantId: plants.map((p) => p.id), task: tasks, doneAt: null }, transaction: t });
    chosen = plants.flatMap((p) => pickWindows(open, p, input.doneOn));
  }
  if (!chosen.length) return;
  const ids = chosen.map((w) => w.id);
  await CareWindow.update({ doneAt: new Date(), doneBy }, { where: { id: ids, doneAt: null }, transaction: t });
  await LogEntryWindow.bulkCreate(ids.map((windowId) => ({ logEntryId: entryId, windowId })), { transaction: t, ignoreDuplicates: true });
}

/** Before an entry goes: its windows open again unless another entry also counts for them. */
export async function reopenWindows(entryId: string, t: Transaction): Promise<void> {
  const links = await LogEntryWindow.findAll({ where: { logEntryId: entryId }, transaction: t });
  if (!links.length) return;
  const ids = links.map((l) => l.windowId);
  const others = await sequelize.query<{ window_id: string }>(
    'SELECT DISTINCT window_id FROM log_entry_windows WHERE window_id IN (:ids) AND log_entry_id <> :entryId',
    { replacements: { ids, entryId }, type: QueryTypes.SELECT, transaction: t },
  );
  const kept = new Set(others.map((o) => o.window_id));
  const reopen = ids.filter((id) => !kept.has(id));
  if (reopen.length) await CareWindow.update({ doneAt: null, doneBy: null }, { where: { id: { [Op.in]: reopen } }, transaction: t });
}
