import { QueryTypes, type Transaction } from 'sequelize';
import { taskLabels, type TaskCode, type Verdict } from '../care';
import { sequelize } from '../db';
import { LogEntry, Photo, User } from '../models';
import type { PlantTypeCode } from '../schemas/catalogue';
import type { Guard, LogEntry as LogEntryDto, Photo as PhotoDto } from '../schemas/log';
import { plantLabel } from './log-plants.service';
import { summarise } from './log-summary';

// Entries as the API answers them, assembled for a page of ids in five queries whatever its size.

type Names = Map<string, string>;
const person = (names: Names, id: string | null) => (id ? { id, name: names.get(id) ?? 'A former member' } : null);

export function photoUrls(groupId: string, photoId: string) {
  const url = `/api/groups/${groupId}/photos/${photoId}`;
  return { url, thumbUrl: `${url}?size=thumb` };
}

export function toPhoto(photo: Photo, names: Names): PhotoDto {
  return { id: photo.id, contentType: photo.contentType, ...photoUrls(photo.groupId, photo.id), uploadedBy: person(names, photo.uploadedBy), createdAt: photo.createdAt.toISOString() };
}

export async function namesOf(ids: (string | null)[], transaction?: Transaction): Promise<Names> {
  const wanted = [...new Set(ids.filter((id): id is string => !!id))];
  const users = wanted.length ? await User.findAll({ where: { id: wanted }, attributes: ['id', 'name'], ...(transaction ? { transaction } : {}) }) : [];
  return new Map(users.map((u) => [u.id, u.name]));
}

interface PlantRow { log_entry_id: string; plant_id: string; guard_verdict: Verdict | null; guard_rules: Guard['rules'] | null; cultivar: string; type_code: PlantTypeCode; site_id: string; site_name: string }
interface WindowRow { log_entry_id: string; id: string; plant_id: string; task: TaskCode }

function groupBy<T, K extends keyof T>(rows: T[], key: K): Map<T[K], T[]> {
  const out = new Map<T[K], T[]>();
  for (const row of rows) out.set(row[key], [...(out.get(row[key]) ?? []), row]);
  return out;
}

/** `transaction` lets a caller inside an open transaction read the rows it has just written. */
export async function loadEntries(groupId: string, ids: string[], transaction?: Transaction): Promise<LogEntryDto[]> {
  if (!ids.length) return [];
  const t = transaction ? { transaction } : {};
  const entries = await LogEntry.findAll({ where: { id: ids, groupId }, ...t });
  const plants = await sequelize.query<PlantRow>(
    `SELECT lep.log_entry_id, lep.plant_id, lep.guard_verdict, lep.guard_rules, p.cultivar, p.type_code, p.site_id, s.name AS site_name
     FROM log_entry_plants lep JOIN plants p ON p.id = lep.plant_id JOIN sites s ON s.id = p.site_id
     WHERE lep.log_entry_id IN (:ids) ORDER BY p.cultivar, p.type_code`,
    { replacements: { ids }, type: QueryTypes.SELECT, ...t },
  );
  const windows = await sequelize.query<WindowRow>(
    'SELECT lew.log_entry_id, cw.id, cw.plant_id, cw.task FROM log_entry_windows lew JOIN care_windows cw ON cw.id = lew.window_id WHERE lew.log_entry_id IN (:ids)',
    { replacements: { ids }, type: QueryTypes.SELECT, ...t },
  );
  const photos = await Photo.findAll({ where: { logEntryId: ids }, order: [['createdAt', 'ASC']], ...t });
  const names = await namesOf([...entries.flatMap((e) => [e.doneBy, e.recordedBy]), ...photos.map((p) => p.uploadedBy)], transaction);
  const plantsBy = groupBy(plants, 'log_entry_id');
  const windowsBy = groupBy(windows, 'log_entry_id');
  const photosBy = groupBy(photos, 'logEntryId');
  const byId = new Map(entries.map((e) => [e.id, e]));
  return ids.filter((id) => byId.has(id)).map((id) => {
    const e = byId.get(id)!;
    return {
      id: e.id, kind: e.kind, details: e.details, summary: summarise(e.kind, e.details),
      doneOn: e.doneOn, doneBy: person(names, e.doneBy), recordedBy: person(names, e.recordedBy), notes: e.notes,
      overrideReason: e.overrideReason, pickingSafeFrom: e.pickingSafeFrom,
      plants: (plantsBy.get(id) ?? []).map((p) => ({
        id: p.plant_id, name: plantLabel(p.cultivar, p.type_code), typeCode: p.type_code, siteId: p.site_id, siteName: p.site_name,
        guard: p.guard_verdict ? { verdict: p.guard_verdict, rules: p.guard_rules ?? [] } : null,
      })),
      windowsDone: (windowsBy.get(id) ?? []).map((w) => ({ id: w.id, plantId: w.plant_id, task: w.task, label: taskLabels[w.task] ?? w.task })),
      photos: (photosBy.get(id) ?? []).map((p) => toPhoto(p, names)),
      createdAt: e.createdAt.toISOString(),
    };
  });
}
