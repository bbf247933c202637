import { todayIn, type IsoDate } from '../care';
import { Site } from '../models';
import type { PlantTypeCode } from '../schemas/catalogue';
import { plantLabel } from './log-plants.service';

/**
 * "Today" for a whole group: the calendar day at its first site, so a late-evening look in London
 * does not jump a day ahead. A group without sites yet uses UTC.
 */
export async function groupToday(groupId: string, now = new Date()): Promise<IsoDate> {
  const site = await Site.findOne({ where: { groupId }, attributes: ['timeZone'], order: [['createdAt', 'ASC']] });
  return todayIn(site?.timeZone ?? 'UTC', now);
}

/** "Victoria plum", or just "Blackcurrant" without a cultivar: the same words as the work log's. */
export function plantTitle(plant: { cultivar: string; typeCode: string }): string {
  return plantLabel(plant.cultivar, plant.typeCode as PlantTypeCode);
}
