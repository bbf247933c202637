import type { Transaction } from 'sequelize';
import { checkStoneFruitCut, isStoneFruit, yearOf, type StoneFruitSymptom } from '../care';
import { validationFailed } from '../lib/errors';
import { Plant, Site } from '../models';
import { plantTypeLabels, type PlantTypeCode } from '../schemas/catalogue';
import type { Guard, LogGuard } from '../schemas/log';
import { stoneFruitSymptoms } from '../schemas/tools';

// The plants an entry names, loaded once with their sites, and the stone-fruit check run on them:
// shared by saving an entry and by the form's question before saving.

export interface LogPlant {
  id: string;
  name: string;
  typeCode: PlantTypeCode;
  siteId: string;
  latitude: number;
  plantedYear: number | null;
  healthFlags: string[];
}

/** "Victoria plum"; just "Blackcurrant" when no cultivar was recorded. */
export function plantLabel(cultivar: string, typeCode: PlantTypeCode): string {
  const type = plantTypeLabels[typeCode];
  // "Cambridge Gage", not "Cambridge Gage gage".
  if (cultivar && cultivar.toLowerCase().includes(type.toLowerCase())) return cultivar;
  return cultivar ? `${cultivar} ${type.toLowerCase()}` : type;
}

/** Every id must be a plant of this group; one that is not reads as unknown, whichever group it is in. */
export async function loadLogPlants(groupId: string, plantIds: string[], transaction?: Transaction): Promise<LogPlant[]> {
  const rows = await Plant.findAll({
    where: { id: plantIds, groupId },
    include: [{ model: Site, as: 'site', attributes: ['id', 'latitude'] }],
    ...(transaction ? { transaction } : {}),
  });
  if (rows.length !== new Set(plantIds).size) throw validationFailed([{ path: 'plantIds', message: 'Choose plants of this group' }]);
  const byId = new Map(rows.map((p) => [p.id, p]));
  return plantIds.map((id) => {
    const p = byId.get(id)!;
    return { id, name: plantLabel(p.cultivar, p.typeCode), typeCode: p.typeCode, siteId: p.siteId, latitude: p.site!.latitude, plantedYear: p.plantedYear, healthFlags: p.healthFlags };
  });
}

const isStoneSymptom = (flag: string): flag is StoneFruitSymptom => (stoneFruitSymptoms as readonly string[]).includes(flag);

/** The check for cutting one plant on one day at its site's latitude; null where it does not apply. */
export function guardFor(plant: LogPlant, date: string): (Guard & { nextSafe?: { from: string; to: string } }) | null {
  if (!isStoneFruit(plant.typeCode)) return null;
  const check = checkStoneFruitCut({
    type: plant.typeCode, date, latitude: plant.latitude, profile: 'uk',
    ...(plant.plantedYear !== null ? { ageYears: Math.max(0, yearOf(date) - plant.plantedYear) } : {}),
    symptoms: plant.healthFlags.filter(isStoneSymptom),
  });
  const rules = check.rules.map(({ code, message, source, effect }) => ({ code, message, source, effect }));
  return { verdict: check.verdict, rules, ...(check.nextSafe ? { nextSafe: check.nextSafe } : {}) };
}

const severity = { ok: 0, caution: 1, avoid: 2 } as const;

export function worstVerdict(verdicts: Guard['verdict'][]): Guard['verdict'] | null {
  return verdicts.reduce<Guard['verdict'] | null>((w, v) => (w === null || severity[v] > severity[w] ? v : w), null);
}

/** What the form shows before saving a cut: each stone-fruit plant's verdict and the worst of them. */
export async function checkLogCut(groupId: string, plantIds: string[], date: string): Promise<LogGuard> {
  const plants = await loadLogPlants(groupId, plantIds);
  const out: LogGuard['plants'] = [];
  for (const plant of plants) {
    const found = guardFor(plant, date);
    if (!found) continue;
    const { nextSafe, ...guard } = found;
    out.push({ id: plant.id, name: plant.name, guard, ...(nextSafe ? { nextSafe } : {}) });
  }
  return { verdict: worstVerdict(out.map((p) => p.guard.verdict)), plants: out };
}
