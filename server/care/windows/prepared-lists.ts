import { plantTypeCodes, type PlantTypeCode } from '../../schemas/catalogue';
import { catalogue, type TaskRule } from '../catalogue';
import type { Hemisphere } from '../dates';
import { prepare } from './rule-window';
import { triggerOutcome } from './triggers';
import type { PreparedWindow, SiteSeason } from './types';

// Each plant type's prepared windows at a site, in opening order. Most of them are the same at
// many sites, so the lists are built once and shared wherever they can be.

const usesDegreeDays = (rule: TaskRule): boolean => rule.opens.kind === 'degree-days' || rule.closes.kind === 'degree-days';
const byOpening = (a: PreparedWindow, b: PreparedWindow): number => (a.base.opens < b.base.opens ? -1 : a.base.opens > b.base.opens ? 1 : 0);
const siteRules = new Map<PlantTypeCode, TaskRule[]>(plantTypeCodes.map((code) => [code, catalogue[code].rules.filter(usesDegreeDays)]));

// Calendar-only windows are the same for every site in a hemisphere, so they are prepared once per
// (season, hemisphere, type) for the whole process; only degree-day windows are prepared per site.
const calendarMaps = new Map<string, Map<string, PreparedWindow[]>>();

export function calendarMap(season: number, hemisphere: Hemisphere): Map<string, PreparedWindow[]> {
  const key = `${season}:${hemisphere}`;
  let map = calendarMaps.get(key);
  if (!map) {
    map = new Map();
    calendarMaps.set(key, map);
  }
  return map;
}

function calendarWindows(type: PlantTypeCode, ss: SiteSeason): PreparedWindow[] {
  let list = ss.calendar.get(type);
  if (!list) {
    list = catalogue[type].rules.filter((r) => !usesDegreeDays(r)).map((r) => prepare(r, null, ss.season, ss.hemisphere)).sort(byOpening);
    ss.calendar.set(type, list);
  }
  return list;
}

const triggerIdsOf = new Map<PlantTypeCode, string[]>(plantTypeCodes.map((code) => [
  code,
  [...new Set((siteRules.get(code) ?? []).flatMap((r) => [r.opens, r.closes]).flatMap((b) => (b.kind === 'degree-days' ? [b.id] : [])))],
]));

// Sites whose triggers fall on the same dates with the same basis get identical windows, and with
// thousands of sites most dates repeat: such lists are built once and shared (they are never
// changed after they are built).
const sharedLists = new Map<string, PreparedWindow[]>();
const SHARED_LIST_LIMIT = 50_000;

function siteListKey(type: PlantTypeCode, ss: SiteSeason): string {
  let key = `${ss.season}|${ss.hemisphere}|${type}|${ss.temperatures.normalsLabel}`;
  for (const id of triggerIdsOf.get(type) ?? []) {
    const o = triggerOutcome(ss, id);
    key += `|${o.reachedOn ?? '-'}${o.date}${o.basis}`;
  }
  return key;
}

export function preparedFor(type: PlantTypeCode, ss: SiteSeason): PreparedWindow[] {
  const own = siteRules.get(type) ?? [];
  if (own.length === 0) return calendarWindows(type, ss);
  let list = ss.siteWindows.get(type);
  if (!list) {
    const key = siteListKey(type, ss);
    list = sharedLists.get(key);
    if (!list) {
      const site = own.map((r) => prepare(r, ss, ss.season, ss.hemisphere));
      list = [...calendarWindows(type, ss), ...site].sort(byOpening);
      if (sharedLists.size >= SHARED_LIST_LIMIT) sharedLists.clear();
      sharedLists.set(key, list);
    }
    ss.siteWindows.set(type, list);
  }
  return list;
}
