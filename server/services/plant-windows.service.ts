import type { z } from 'zod';
import {
  checkStoneFruitCut, formatDay, hemisphereOf, isStoneFruit, monthOf, seasonWindows, taskLabels, TEMPERATE_DEFAULT_LABEL, todayIn, yearOf,
  type IsoDate, type StoneFruitSymptom,
} from '../care';
import { notFound } from '../lib/errors';
import { Plant, Site } from '../models';
import { stoneFruitSymptoms } from '../schemas/tools';
import type { PlantWindows, plantWindowsQuerySchema } from '../schemas/windows';
import { loadSiteClimate, type SiteClimate } from './site-climate.service';
import { toStoneFruitResponse } from './tools.service';

type Query = z.output<typeof plantWindowsQuerySchema>;

const FIXED_DATES = 'Windows on fixed dates follow the calendar.';

/** What the degree-day windows rest on, in the grower's words: readings to a date, then a projection. */
function basisNote(climate: SiteClimate): string {
  const fill = climate.normals.length ? "the site's monthly normals" : TEMPERATE_DEFAULT_LABEL;
  if (!climate.latestReading) {
    return climate.normals.length
      ? `Projected from the site's monthly normals — no readings for this season yet. ${FIXED_DATES}`
      : `Projected from typical temperatures — no readings for this site yet (${TEMPERATE_DEFAULT_LABEL} stand in). ${FIXED_DATES}`;
  }
  const to = `${formatDay(climate.latestReading)} ${yearOf(climate.latestReading)}`;
  return `Based on readings to ${to}; days without a reading are projected from ${fill}. ${FIXED_DATES}`;
}

/** The season a day belongs to: the calendar year in the north, July to June in the south. */
export function seasonContaining(on: IsoDate, latitude: number): number {
  return hemisphereOf(latitude) === 'south' && monthOf(on) < 7 ? yearOf(on) - 1 : yearOf(on);
}

const isStoneSymptom = (flag: string): flag is StoneFruitSymptom => (stoneFruitSymptoms as readonly string[]).includes(flag);

export async function plantWindows(groupId: string, plantId: string, query: Query): Promise<PlantWindows> {
  const plant = await Plant.findOne({ where: { id: plantId, groupId }, include: [{ model: Site, as: 'site', attributes: ['id', 'latitude', 'longitude', 'timeZone'] }] });
  if (!plant?.site) throw notFound('Plant');
  const { latitude, longitude, timeZone } = plant.site;
  // "Today" is the site's own calendar day, so a late-evening look does not jump a day ahead.
  const on = query.on ?? todayIn(timeZone);
  const season = query.season ?? seasonContaining(on, latitude);
  // Read live on every request, so a reading added a moment ago already moves the windows.
  const climate = await loadSiteClimate(plant.site, season);
  const windows = seasonWindows({
    plant: { typeCode: plant.typeCode, form: plant.form, plantedYear: plant.plantedYear, healthFlags: plant.healthFlags },
    site: { latitude, longitude, timeZone },
    season,
    on,
    readings: climate.readings,
    ...(climate.normals.length ? { normals: climate.normals } : {}),
  });
  const stoneFruitCheck = isStoneFruit(plant.typeCode)
    ? toStoneFruitResponse(checkStoneFruitCut({
        type: plant.typeCode, date: on, latitude, profile: 'uk',
        ...(plant.plantedYear !== null ? { ageYears: Math.max(0, yearOf(on) - plant.plantedYear) } : {}),
        symptoms: plant.healthFlags.filter(isStoneSymptom),
      }))
    : null;
  return {
    season,
    on,
    windows: windows.map((w) => ({
      task: w.task, key: w.key, label: taskLabels[w.task], opens: w.opens, closes: w.closes, state: w.state, basis: w.basis,
      source: w.source, reason: w.reason, ...(w.detail ? { detail: w.detail } : {}),
    })),
    stoneFruitCheck,
    basisNote: basisNote(climate),
  };
}
