import { plantForms, plantTypeCodes, type HealthFlag, type PlantForm, type PlantTypeCode } from '../schemas/catalogue';
import { addDays, clampedDate, daysBetween, hemisphereOf, isIsoDate, southernMonthWords, type Hemisphere, type IsoDate } from './dates';
import { accumulateExtremes, CareInputError, type DailyTemperature, type DegreeDayOptions } from './degree-days';
import {
  catalogue, catalogueBases, degreeDayTriggers, formMatches,
  type CalendarBound, type CloseBound, type DegreeDayTrigger, type MonthDay, type OpenBound, type TaskCode, type TaskRule,
} from './catalogue';
import { projectSeason, type MonthlyNormal, type SeasonTemperatures } from './projection';
import { cite, type SourceLabel } from './sources';

// A plant's care windows for one season, and their state on a given day.
//
// The engine never reads the clock: callers pass `on`. seasonWindows() defaults it to the first day
// of the season (1 January in the north, 1 July in the south), so a call without it is repeatable.
//
// A season is a calendar year in the north and 1 July – 30 June in the south; every calendar bound
// moves six months on for a southern site and degree-days count from 1 July there. Dormant-season
// work belongs to the season whose growth it prepares, so a season's winter pruning opens the
// previous November (the previous May in the south): ask for season + 1 to see next winter's.
//
// For speed, siteSeason() does the per-site work once (projection, running degree-day totals for
// every base the catalogue uses, the date each trigger is reached) and windowsForPlant() only picks
// the rules that fit a plant and stamps each window's state.

export type WindowState = 'upcoming' | 'open' | 'closing' | 'passed';
export type WindowBasis = 'readings' | 'projection' | 'calendar';

export interface Window {
  task: TaskCode;
  /** The rule's key, unique within the plant's type and stable between seasons. */
  key: string;
  opens: IsoDate;
  closes: IsoDate;
  state: WindowState;
  basis: WindowBasis;
  source: string;
  reason: string;
  detail?: string;
  triggeredBy?: { degreeDays: number; base: number; since: IsoDate; reachedOn?: IsoDate };
}

/** The same shape under a name that does not shadow the browser's global `Window` in client code. */
export type CareWindow = Window;

export interface PlantInput {
  typeCode: PlantTypeCode;
  form: PlantForm;
  plantedYear?: number | null;
  healthFlags?: readonly HealthFlag[];
}

export interface SiteInput {
  latitude: number;
  longitude: number;
  timeZone?: string;
}

/** When a degree-day trigger is reached at one site in one season. */
export interface TriggerOutcome {
  trigger: DegreeDayTrigger;
  since: IsoDate;
  reachedOn?: IsoDate;
  /** The date the window uses: reachedOn held within the trigger's calendar guard rails. */
  date: IsoDate;
  basis: WindowBasis;
}

export interface SiteSeason {
  season: number;
  hemisphere: Hemisphere;
  temperatures: SeasonTemperatures;
  /** Running degree-day totals from the season's start, by base temperature (°C). */
  cumulative: ReadonlyMap<number, Float64Array>;
  triggers: ReadonlyMap<string, TriggerOutcome>;
  /** Windows that depend on this site's degree-days, prepared on first use. */
  siteWindows: Map<string, PreparedWindow[]>;
}

interface PreparedWindow {
  rule: TaskRule;
  base: Omit<Window, 'state'>;
  closingFrom: IsoDate;
}

/**
 * Single sine (Baskerville & Emin 1969) with no upper threshold: the method the published
 * sweet-cherry and green-tip totals were computed with (S51, S49), and the one used to derive ours.
 */
export const windowDegreeDayMethod: Omit<DegreeDayOptions, 'lower'> = { method: 'single-sine' };

const CLOSING_DAYS = 7;

// ---- Calendar ----

const MONTHS = ['January', 'February', 'March', 'April', 'May', 'June', 'July', 'August', 'September', 'October', 'November', 'December'];

/** "24 July": dates in reasons are read by growers, not parsed. */
export function formatDay(date: IsoDate): string {
  return `${Number(date.slice(8, 10))} ${MONTHS[Number(date.slice(5, 7)) - 1] ?? ''}`;
}

const DAYS_IN_MONTH = [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];

/**
 * A northern month and day in a season, six months on in the south. A bound on a month's last day
 * (30 June, 28 or 29 February) means the end of that month, so it lands on the last day of the
 * month it moves to: the end of June becomes the end of December, not 30 December.
 */
export function calendarDate(bound: MonthDay & { yearOffset?: number }, season: number, hemisphere: Hemisphere): IsoDate {
  const shift = hemisphere === 'south' ? 6 : 0;
  const months = (season + (bound.yearOffset ?? 0)) * 12 + (bound.month - 1) + shift;
  const isMonthEnd = bound.day >= (DAYS_IN_MONTH[bound.month - 1] ?? 31);
  return clampedDate(Math.floor(months / 12), (months % 12) + 1, isMonthEnd ? 31 : bound.day);
}

export function windowState(opens: IsoDate, closes: IsoDate, on: IsoDate): WindowState {
  if (on < opens) return 'upcoming';
  if (on > closes) return 'passed';
  return on >= addDays(closes, 1 - CLOSING_DAYS) ? 'closing' : 'open';
}

// ---- Degree-day triggers at one site ----

function firstIndexAtLeast(cum: Float64Array, from: number, target: number): number {
  let lo = from;
  let hi = cum.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if ((cum[mid] as number) >= target) hi = mid;
    else lo = mid + 1;
  }
  return lo;
}

function resolveTrigger(trigger: DegreeDayTrigger, temps: SeasonTemperatures, cum: Float64Array, projectedBefore: Int32Array): TriggerOutcome {
  const { season, hemisphere, start } = temps;
  const since = trigger.from ? calendarDate(trigger.from, season, hemisphere) : start;
  const fromIndex = Math.max(0, daysBetween(start, since));
  const offset = fromIndex > 0 ? (cum[fromIndex - 1] as number) : 0;
  const index = firstIndexAtLeast(cum, fromIndex, offset + trigger.degreeDays);
  const earliest = calendarDate(trigger.earliest, season, hemisphere);
  const latest = calendarDate(trigger.latest, season, hemisphere);
  if (index >= cum.length) return { trigger, since, date: latest, basis: 'calendar' };
  const reachedOn = addDays(start, index);
  const date = reachedOn < earliest ? earliest : reachedOn > latest ? latest : reachedOn;
  const projectedDays = (projectedBefore[index + 1] as number) - (projectedBefore[fromIndex] as number);
  return { trigger, since, reachedOn, date, basis: projectedDays === 0 ? 'readings' : 'projection' };
}

function projectedPrefix(temps: SeasonTemperatures): Int32Array {
  const out = new Int32Array(temps.length + 1);
  for (let i = 0; i < temps.length; i++) out[i + 1] = (out[i] as number) + (temps.isReading[i] === 1 ? 0 : 1);
  return out;
}

/** Everything about a site's season that does not depend on the plant, computed once. */
export function siteSeason(site: SiteInput, season: number, readings?: readonly DailyTemperature[], normals?: readonly MonthlyNormal[]): SiteSeason {
  const temperatures = projectSeason({ season, latitude: site.latitude, ...(readings ? { readings } : {}), ...(normals ? { normals } : {}) });
  const cumulative = new Map<number, Float64Array>();
  for (const base of catalogueBases) {
    cumulative.set(base, accumulateExtremes(temperatures.tmin, temperatures.tmax, { ...windowDegreeDayMethod, lower: base }));
  }
  const projectedBefore = projectedPrefix(temperatures);
  const triggers = new Map<string, TriggerOutcome>();
  for (const trigger of degreeDayTriggers) {
    triggers.set(trigger.id, resolveTrigger(trigger, temperatures, cumulative.get(trigger.base) as Float64Array, projectedBefore));
  }
  return { season, hemisphere: temperatures.hemisphere, temperatures, cumulative, triggers, siteWindows: new Map() };
}

// ---- Preparing a rule's window ----

type Words = (text: string) => string;
const asWritten: Words = (text) => text;

function triggerText(outcome: TriggerOutcome, normalsLabel: string, words: Words): string {
  const { trigger, reachedOn, date } = outcome;
  const cue = { reached: words(trigger.cue.reached), expected: words(trigger.cue.expected) };
  const total = `${trigger.degreeDays} degree-days since ${formatDay(outcome.since)} (base ${trigger.base} °C)`;
  if (!reachedOn) return `${cue.expected} by ${formatDay(date)} at the latest: this site is not expected to reach ${total} this season`;
  const guard = date > reachedOn ? `; held to ${formatDay(date)}, the earliest usual date` : date < reachedOn ? `; held to ${formatDay(date)}, the latest usual date` : '';
  if (outcome.basis === 'readings') return `${cue.reached}: ${total}, reached on ${formatDay(reachedOn)}${guard}`;
  return `${cue.expected} around ${formatDay(reachedOn)}, when ${total} should be reached (projected from ${normalsLabel})${guard}`;
}

function boundDate(bound: OpenBound | CalendarBound | DegreeDayTrigger, ss: SiteSeason | null, season: number, hemisphere: Hemisphere): { date: IsoDate; outcome?: TriggerOutcome } {
  if (bound.kind === 'date') return { date: calendarDate(bound, season, hemisphere) };
  const outcome = ss?.triggers.get(bound.id);
  if (!outcome) throw new Error(`Degree-day trigger ${bound.id} was not resolved for this site.`);
  return { date: outcome.date, outcome };
}

function closeDate(bound: CloseBound, opens: IsoDate, ss: SiteSeason | null, season: number, hemisphere: Hemisphere): { date: IsoDate; outcome?: TriggerOutcome } {
  if (bound.kind === 'after-opens') return { date: addDays(opens, bound.days) };
  const closes = boundDate(bound, ss, season, hemisphere);
  // A late trigger can push the opening past a fixed close: keep at least a week to do the job.
  return closes.date < opens ? { ...closes, date: addDays(opens, CLOSING_DAYS - 1) } : closes;
}

function mergedSources(rule: TaskRule, outcomes: TriggerOutcome[]): string {
  const labels = new Set<SourceLabel>(rule.source);
  for (const o of outcomes) for (const label of o.trigger.source) labels.add(label);
  return cite([...labels]);
}

function windowBasis(outcomes: TriggerOutcome[]): WindowBasis {
  if (outcomes.length === 0) return 'calendar';
  if (outcomes.some((o) => o.basis === 'projection')) return 'projection';
  return outcomes.some((o) => o.basis === 'readings') ? 'readings' : 'calendar';
}

function prepare(rule: TaskRule, ss: SiteSeason | null, season: number, hemisphere: Hemisphere): PreparedWindow {
  const open = boundDate(rule.opens, ss, season, hemisphere);
  const close = closeDate(rule.closes, open.date, ss, season, hemisphere);
  const outcomes = [open.outcome, close.outcome].filter((o): o is TriggerOutcome => o !== undefined);
  const normalsLabel = ss?.temperatures.normalsLabel ?? '';
  // The catalogue's wording names northern months; a southern site reads them six months on.
  const words = hemisphere === 'south' ? southernMonthWords : asWritten;
  const ruleReason = words(rule.reason);
  const reason = open.outcome
    ? `${triggerText(open.outcome, normalsLabel, words)}. ${ruleReason}.`
    : close.outcome ? `${ruleReason}. ${triggerText(close.outcome, normalsLabel, words)}.` : `${ruleReason}.`;
  const first = outcomes[0];
  const base: Omit<Window, 'state'> = {
    task: rule.task, key: rule.key, opens: open.date, closes: close.date, basis: windowBasis(outcomes),
    source: mergedSources(rule, outcomes), reason,
    ...(rule.detail ? { detail: words(rule.detail) } : {}),
    ...(first ? { triggeredBy: { degreeDays: first.trigger.degreeDays, base: first.trigger.base, since: first.since, ...(first.reachedOn ? { reachedOn: first.reachedOn } : {}) } } : {}),
  };
  return { rule, base, closingFrom: addDays(close.date, 1 - CLOSING_DAYS) };
}

const usesDegreeDays = (rule: TaskRule): boolean => rule.opens.kind === 'degree-days' || rule.closes.kind === 'degree-days';

// Calendar-only windows are the same for every site in a hemisphere, so they are prepared once per
// (season, hemisphere, type) for the whole process; only degree-day windows are prepared per site.
const calendarCache = new Map<string, PreparedWindow[]>();

function calendarWindows(type: PlantTypeCode, season: number, hemisphere: Hemisphere): PreparedWindow[] {
  const key = `${season}:${hemisphere}:${type}`;
  let list = calendarCache.get(key);
  if (!list) {
    list = catalogue[type].rules.filter((r) => !usesDegreeDays(r)).map((r) => prepare(r, null, season, hemisphere));
    calendarCache.set(key, list);
  }
  return list;
}

function preparedFor(type: PlantTypeCode, ss: SiteSeason): PreparedWindow[] {
  let list = ss.siteWindows.get(type);
  if (!list) {
    const site = catalogue[type].rules.filter(usesDegreeDays).map((r) => prepare(r, ss, ss.season, ss.hemisphere));
    list = [...calendarWindows(type, ss.season, ss.hemisphere), ...site].sort((a, b) => (a.base.opens < b.base.opens ? -1 : a.base.opens > b.base.opens ? 1 : 0));
    ss.siteWindows.set(type, list);
  }
  return list;
}

// ---- Choosing the rules for a plant ----

function fits(rule: TaskRule, plant: PlantInput, isFormative: boolean): boolean {
  if (!formMatches(rule.forms, plant.form)) return false;
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
    if (!fits(p.rule, plant, isFormative)) continue;
    const b = p.base;
    const state: WindowState = on < b.opens ? 'upcoming' : on > b.closes ? 'passed' : on >= p.closingFrom ? 'closing' : 'open';
    out.push({ ...b, state });
  }
  return out;
}

// ---- The one-call form ----

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

/** Degree-days at a site from `since` to `through` (both included), on the windows' method. */
export function degreeDaysBetween(ss: SiteSeason, base: number, since: IsoDate, through: IsoDate): number {
  const cum = ss.cumulative.get(base) ?? accumulateExtremes(ss.temperatures.tmin, ss.temperatures.tmax, { ...windowDegreeDayMethod, lower: base });
  const start = ss.temperatures.start;
  const a = Math.max(0, daysBetween(start, since));
  const b = Math.min(cum.length - 1, daysBetween(start, through));
  if (b < a) return 0;
  return (cum[b] as number) - (a > 0 ? (cum[a - 1] as number) : 0);
}
