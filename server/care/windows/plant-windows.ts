import { plantForms, plantTypeCodes } from '../../schemas/catalogue';
import { catalogue } from '../catalogue';
import { hemisphereOf, isIsoDate, type IsoDate } from '../dates';
import type { DailyTemperature } from '../degree-days';
import { CareInputError } from '../errors';
import type { MonthlyNormal } from '../projection';
import { preparedFor } from './prepared-lists';
import { siteSeason } from './site-season';
import type { PlantInput, PreparedWindow, SiteInput, SiteSeason, Window, WindowState } from './types';

// A plant's windows: the prepared windows of its type that fit its form, age and health, each
// stamped with its state on the day asked about. This runs once per plant, so it does no date
// arithmetic: the state comes from dates prepared with the window (as windowState() would give it).

function fits(p: PreparedWindow, plant: PlantInput, isFormative: boolean): boolean {
  if (!p.forms.has(plant.form)) return false;
  const rule = p.rule;
  if (rule.age === 'formative' && !isFormative) return false;
  if (rule.age === 'established' && isFormative) return false;
  if (rule.health) return plant.healthFlags?.some((flag) => rule.health?.includes(flag)) ?? false;
  return true;
}

/** The plant's windows in a prepared site season, with their state on `on`. */
export function windowsForPlant(plant: PlantInput, ss: SiteSeason, on: IsoDate): Window[] {
  const profile = catalogue[plant.typeCode];
  const planted = plant.plantedYear ?? null;
  if (planted !== null && planted > ss.season) return []; // not in the ground yet
  const isFormative = planted !== null && ss.season - planted <= profile.formativeYears;
  const out: Window[] = [];
  for (const p of preparedFor(plant.typeCode, ss)) {
    if (!fits(p, plant, isFormative)) continue;
    const b = p.base;
    const state: WindowState = on < b.opens ? 'upcoming' : on > b.closes ? 'passed' : on >= p.closingFrom ? 'closing' : 'open';
    // One literal with every key, in one order: objects of one shape keep this loop fast, where a
    // spread of differently shaped bases was several times slower and filled the heap.
    out.push({
      task: b.task, key: b.key, opens: b.opens, closes: b.closes, state, basis: b.basis,
      source: b.source, reason: b.reason, detail: b.detail, triggeredBy: b.triggeredBy,
    });
  }
  return out;
}

// The one-call form, for callers with one plant and no prepared site season.
export interface SeasonWindowsInput {
  plant: PlantInput;
  site: SiteInput;
  season: number;
  readings?: readonly DailyTemperature[];
  normals?: readonly MonthlyNormal[];
  /** Defaults to the season's first day; the engine never reads today's date from the clock. */
  on?: IsoDate;
  /** A siteSeason() already computed for this site and season, to skip the per-site work. */
  accumulation?: SiteSeason;
}

function checkPlant(plant: PlantInput): void {
  if (!(plantTypeCodes as readonly string[]).includes(plant.typeCode)) throw new CareInputError('Choose a plant type from the catalogue.', 'plant.typeCode');
  if (!(plantForms as readonly string[]).includes(plant.form)) throw new CareInputError('Choose a form from the list.', 'plant.form');
  const year = plant.plantedYear;
  if (year !== undefined && year !== null && !Number.isInteger(year)) throw new CareInputError('Planted year must be a whole year.', 'plant.plantedYear');
}

export function seasonWindows(input: SeasonWindowsInput): Window[] {
  checkPlant(input.plant);
  if (input.on !== undefined && !isIsoDate(input.on)) throw new CareInputError('Use the form YYYY-MM-DD for the date.', 'on');
  const ss = input.accumulation ?? siteSeason(input.site, input.season, input.readings, input.normals);
  if (ss.season !== input.season || ss.hemisphere !== hemisphereOf(input.site.latitude)) {
    throw new CareInputError('The precomputed accumulation belongs to another season or hemisphere.', 'accumulation');
  }
  return windowsForPlant(input.plant, ss, input.on ?? ss.temperatures.start);
}
