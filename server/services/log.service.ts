import { Op, literal, type Transaction, type WhereOptions } from 'sequelize';
import { addDays } from '../care';
import { sequelize } from '../db';
import { AppError, forbidden, notFound, validationFailed } from '../lib/errors';
import { LogEntry, LogEntryPlant, Membership, Photo } from '../models';
import { roleRank, type Role } from '../schemas/group';
import type { LogEntry as LogEntryDto, LogEntryInput, LogList, logListQuerySchema } from '../schemas/log';
import type { z } from 'zod';
import { guardFor, loadLogPlants, worstVerdict, type LogPlant } from './log-plants.service';
import { loadEntries } from './log-read.service';
import { markWindowsDone, reopenWindows } from './log-windows.service';
import { removePhotoFiles } from './photo.service';

type ListQuery = z.output<typeof logListQuerySchema>;

export interface CreateLogOptions {
  /** The caller's role; needed only to record work on behalf of someone else (grower or owner). */
  role?: Role;
  /** Run inside the caller's transaction (a ticked-off job writes its own rows beside the entry). */
  transaction?: Transaction;
  /** Mark exactly these care windows done instead of the ones the entry's kind and day match. */
  windowIds?: string[];
}

async function resolveDoneBy(groupId: string, userId: string, input: LogEntryInput, options: CreateLogOptions, t: Transaction): Promise<string> {
  if (!input.doneBy || input.doneBy === userId) return userId;
  if (!options.role || roleRank(options.role) < roleRank('grower')) throw forbidden('Only growers and owners may record work done by someone else');
  const member = await Membership.findOne({ where: { groupId, userId: input.doneBy }, attributes: ['userId'], transaction: t });
  if (!member) throw validationFailed([{ path: 'doneBy', message: 'Choose a member of this group' }]);
  return input.doneBy;
}

/** The stone-fruit check for a cut: refused on "avoid" unless a reason is given (issue 6). */
function guardCut(input: LogEntryInput, plants: LogPlant[]) {
  if (input.kind !== 'prune') return new Map<string, ReturnType<typeof guardFor>>();
  const guards = new Map(plants.map((p) => [p.id, guardFor(p, input.doneOn)]));
  const avoided = plants.filter((p) => guards.get(p.id)?.verdict === 'avoid');
  if (avoided.length && !input.overrideReason) {
    const why = guards.get(avoided[0]!.id)!.rules.filter((r) => r.effect === 'avoid').map((r) => r.message).join(' ');
    const names = avoided.map((p) => p.name).join(', ');
    throw new AppError('UNPROCESSABLE', `The stone-fruit check says to avoid cutting ${names} on ${input.doneOn}. ${why} Give a reason to record the cut anyway.`, [
      { path: 'overrideReason', message: 'Say why this cut was made although the check says to avoid it' },
    ]);
  }
  return guards;
}

async function insertEntry(groupId: string, userId: string, input: LogEntryInput, options: CreateLogOptions, t: Transaction): Promise<string> {
  const plants = await loadLogPlants(groupId, input.plantIds, t);
  const doneBy = await resolveDoneBy(groupId, userId, input, options, t);
  const guards = guardCut(input, plants);
  const hasAvoid = worstVerdict([...guards.values()].flatMap((g) => (g ? [g.verdict] : []))) === 'avoid';
  const entry = await LogEntry.create({
    groupId, kind: input.kind, details: input.details as Record<string, unknown>, doneOn: input.doneOn, doneBy, recordedBy: userId, notes: input.notes,
    // A reason is kept only where the check asked for one, so the history never shows a stray one.
    overrideReason: hasAvoid ? input.overrideReason ?? null : null,
    pickingSafeFrom: input.kind === 'spray' ? addDays(input.doneOn, input.details.harvestIntervalDays) : null,
  }, { transaction: t });
  await LogEntryPlant.bulkCreate(plants.map((p) => {
    const g = guards.get(p.id);
    return { logEntryId: entry.id, plantId: p.id, guardVerdict: g?.verdict ?? null, guardRules: g?.rules ?? null };
  }), { transaction: t });
  await markWindowsDone(entry.id, groupId, input, doneBy, plants, t, options.windowIds);
  return entry.id;
}

/** Records one job. The other half of issue 6 (ticking off an assigned job) calls this too. */
export async function createLogEntry(groupId: string, userId: string, input: LogEntryInput, options: CreateLogOptions = {}): Promise<LogEntryDto> {
  const { transaction } = options;
  const id = transaction ? await insertEntry(groupId, userId, input, options, transaction) : await sequelize.transaction((t) => insertEntry(groupId, userId, input, options, t));
  const [entry] = await loadEntries(groupId, [id], transaction);
  return entry!;
}

export async function getLogEntry(groupId: string, entryId: string): Promise<LogEntryDto> {
  const [entry] = await loadEntries(groupId, [entryId]);
  if (!entry) throw notFound('Log entry');
  return entry;
}

export function logWhere(groupId: string, q: Omit<ListQuery, 'page' | 'pageSize'>): WhereOptions {
  const and: WhereOptions[] = [{ groupId }];
  if (q.kind) and.push({ kind: q.kind });
  if (q.personId) and.push({ doneBy: q.personId });
  if (q.from) and.push({ doneOn: { [Op.gte]: q.from } });
  if (q.to) and.push({ doneOn: { [Op.lte]: q.to } });
  // Ids are parsed as uuids before they get here; escape() keeps the literal safe all the same.
  if (q.plantId) and.push({ id: { [Op.in]: literal(`(SELECT log_entry_id FROM log_entry_plants WHERE plant_id = ${sequelize.escape(q.plantId)})`) } });
  if (q.siteId) and.push({ id: { [Op.in]: literal(`(SELECT lep.log_entry_id FROM log_entry_plants lep JOIN plants p ON p.id = lep.plant_id WHERE p.site_id = ${sequelize.escape(q.siteId)})`) } });
  return { [Op.and]: and };
}

export async function listLog(groupId: string, q: ListQuery): Promise<LogList> {
  const { rows, count } = await LogEntry.findAndCountAll({
    where: logWhere(groupId, q), attributes: ['id'],
    order: [['doneOn', 'DESC'], ['createdAt', 'DESC'], ['id', 'ASC']],
    limit: q.pageSize, offset: (q.page - 1) * q.pageSize,
  });
  return { items: await loadEntries(groupId, rows.map((r) => r.id)), total: count, page: q.page, pageSize: q.pageSize };
}

/** Its author or an owner may delete an entry; its photos go with it and its windows open again. */
export async function deleteLogEntry(groupId: string, userId: string, role: Role, entryId: string): Promise<void> {
  const entry = await LogEntry.findOne({ where: { id: entryId, groupId } });
  if (!entry) throw notFound('Log entry');
  if (entry.recordedBy !== userId && role !== 'owner') throw forbidden('Only the person who recorded this entry, or an owner, may delete it');
  const photos = await Photo.findAll({ where: { logEntryId: entryId }, attributes: ['groupId', 'fileName', 'thumbName'] });
  await sequelize.transaction(async (t) => {
    await reopenWindows(entryId, t);
    await entry.destroy({ transaction: t });
  });
  await removePhotoFiles(photos);
}
