import { plantForms, plantTypeCodes, type HealthFlag, type PlantForm, type PlantTypeCode } from '../schemas/catalogue';
import { addDays, clampedDate, daysBetween, hemisphereOf, isIsoDate, southernMonthWords, type Hemisphere, type IsoDate } from './dates';
import { accumulateExtremes, CareInputError, type DailyTemperature, type DegreeDayOptions } from './degree-days';
import {
  catalogue, degreeDayTriggers, formMatches,
  type CalendarBound, type CloseBound, type DegreeDayTrigger, type MonthDay, type OpenBound, type TaskCode, type TaskRule,
} from './catalogue';
import { projectSeason, seasonDateList, type MonthlyNormal, type SeasonTemperatures } from './projection';
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
// For speed, the per-site work is done once per site and season: siteSeason() makes the projection,
// and the first plant that needs a degree-day trigger has its base accumulated and all of that
// base's triggers resolved, kept in the SiteSeason. Windows that do not depend on the site are
// prepared once per season and hemisphere for the whole process. windowsForPlant() then only picks
// the rules that fit a plant and stamps each window's state.

export type WindowState = 'upcoming' | 'open' | 'closing' | 'passed';
export type WindowBasis = 'readings' | 'projection' | 'calendar';

/**
 * `detail` and `triggeredBy` may be present with the value undefined (JSON leaves them out).
 * Windows of plants at one site share their frozen `triggeredBy` object.
 */
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
  /** Running degree-day totals for the whole season by base (°C), filled on request by cumulativeDegreeDays(). */
  cumulative: Map<number, Float64Array>;
  /** Trigger outcomes by trigger id, filled base by base on first need: read them with triggerOutcome(). */
  triggers: Map<string, TriggerOutcome>;
  /** Each type's prepared windows at this site, looked up on first use (shared, never changed). */
  siteWindows: Map<string, PreparedWindow[]>;
  /** Calendar-only windows by type, one map shared by every site of the season and hemisphere. */
  calendar: Map<string, PreparedWindow[]>;
}

/** A rule's window worked out for a season, before a plant and a day are known. Never changed once built. */
export interface PreparedWindow {
  rule: TaskRule;
  /** The forms the rule applies to, as a set: checked for every plant. */
  forms: ReadonlySet<PlantForm>;
  base: Omit<Window, 'state'>;
  closingFrom: IsoDate;
}

/**
 * Single sine (Baskerville & Emin 1969) with no upper threshold: the method of the published
 * sweet-cherry bloom model (S51). Every trigger uses it, the derived totals included, so that they
 * agree with one another; the UMass green-tip rule (S49) does not name its method.
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

interface TriggerCalendar {
  since: IsoDate;
  fromIndex: number;
  earliest: IsoDate;
  latest: IsoDate;
  latestIndex: number;
}

// A trigger's dates depend only on the season and hemisphere, so every site shares them.
const triggerCalendarCache = new Map<string, TriggerCalendar>();

function triggerCalendar(trigger: DegreeDayTrigger, temps: SeasonTemperatures): TriggerCalendar {
  const { season, hemisphere, start } = temps;
  const key = `${season}:${hemisphere}:${trigger.id}`;
  let cal = triggerCalendarCache.get(key);
  if (!cal) {
    const since = trigger.from ? calendarDate(trigger.from, season, hemisphere) : start;
    const latest = calendarDate(trigger.latest, season, hemisphere);
    cal = {
      since,
      fromIndex: Math.max(0, daysBetween(start, since)),
      earliest: calendarDate(trigger.earliest, season, hemisphere),
      latest,
      latestIndex: Math.min(temps.length - 1, daysBetween(start, latest)),
    };
    triggerCalendarCache.set(key, cal);
  }
  return cal;
}

/**
 * The days one base has to be accumulated over: from the earliest biofix to the latest guard date
 * of the triggers using it. Past a trigger's latest date its window opens on that date whatever
 * the total, so the rest of the season is not needed, and skipping it halves the per-site work.
 */
interface BaseSpan {
  base: number;
  first: number;
  last: number;
}

const spanCache = new Map<string, BaseSpan[]>();

function baseSpans(temps: SeasonTemperatures): BaseSpan[] {
  const key = `${temps.season}:${temps.hemisphere}`;
  let spans = spanCache.get(key);
  if (!spans) {
    const byBase = new Map<number, BaseSpan>();
    for (const trigger of degreeDayTriggers) {
      const cal = triggerCalendar(trigger, temps);
      const span = byBase.get(trigger.base) ?? { base: trigger.base, first: cal.fromIndex, last: cal.latestIndex };
      byBase.set(trigger.base, { base: span.base, first: Math.min(span.first, cal.fromIndex), last: Math.max(span.last, cal.latestIndex) });
    }
    spans = [...byBase.values()];
    spanCache.set(key, spans);
  }
  return spans;
}

function resolveTrigger(trigger: DegreeDayTrigger, temps: SeasonTemperatures, span: BaseSpan, cum: Float64Array, projectedBefore: Int32Array): TriggerOutcome {
  const { since, fromIndex, earliest, latest, latestIndex } = triggerCalendar(trigger, temps);
  const from = fromIndex - span.first; // cum[0] is the total of day span.first
  const offset = from > 0 ? (cum[from - 1] as number) : 0;
  const found = firstIndexAtLeast(cum, from, offset + trigger.degreeDays) + span.first;
  if (found > latestIndex) return { trigger, since, date: latest, basis: 'calendar' };
  const reachedOn = seasonDateList(temps)[found] as IsoDate;
  const date = reachedOn < earliest ? earliest : reachedOn;
  const projectedDays = (projectedBefore[found + 1] as number) - (projectedBefore[fromIndex] as number);
  return { trigger, since, reachedOn, date, basis: projectedDays === 0 ? 'readings' : 'projection' };
}

function projectedPrefix(temps: SeasonTemperatures): Int32Array {
  const out = new Int32Array(temps.length + 1);
  for (let i = 0; i < temps.length; i++) out[i + 1] = (out[i] as number) + (temps.isReading[i] === 1 ? 0 : 1);
  return out;
}

/**
 * Everything about a site's season that does not depend on the plant. The projection is made here;
 * each base's degree-days are accumulated, and its triggers resolved, once, when a plant first needs
 * one of them (a site without apples or vines never pays for their triggers).
 */
export function siteSeason(site: SiteInput, season: number, readings?: readonly DailyTemperature[], normals?: readonly MonthlyNormal[]): SiteSeason {
  const temperatures = projectSeason({ season, latitude: site.latitude, ...(readings ? { readings } : {}), ...(normals ? { normals } : {}) });
  const { hemisphere } = temperatures;
  return { season, hemisphere, temperatures, cumulative: new Map(), triggers: new Map(), siteWindows: new Map(), calendar: calendarMap(season, hemisphere) };
}

// The prefix counts of projected days, kept per season object without widening its public shape.
const projectedCounts = new WeakMap<SeasonTemperatures, Int32Array>();

function resolveBase(ss: SiteSeason, base: number): void {
  const temps = ss.temperatures;
  const span = baseSpans(temps).find((x) => x.base === base);
  if (!span) return;
  let projectedBefore = projectedCounts.get(temps);
  if (!projectedBefore) {
    projectedBefore = projectedPrefix(temps);
    projectedCounts.set(temps, projectedBefore);
  }
  const cum = accumulateExtremes(temps.tmin.subarray(span.first, span.last + 1), temps.tmax.subarray(span.first, span.last + 1), { ...windowDegreeDayMethod, lower: base });
  for (const trigger of degreeDayTriggers) {
    if (trigger.base === base) ss.triggers.set(trigger.id, resolveTrigger(trigger, temps, span, cum, projectedBefore));
  }
}

/** When a degree-day trigger is reached at this site, worked out on first request. */
export function triggerOutcome(ss: SiteSeason, id: string): TriggerOutcome {
  let outcome = ss.triggers.get(id);
  if (!outcome) {
    const trigger = degreeDayTriggers.find((t) => t.id === id);
    if (!trigger) throw new CareInputError(`There is no degree-day trigger called ${id}.`, 'trigger');
    resolveBase(ss, trigger.base);
    outcome = ss.triggers.get(id) as TriggerOutcome;
  }
  return outcome;
}

/** Running degree-day totals from the season's start at a base (°C), on the windows' method. */
export function cumulativeDegreeDays(ss: SiteSeason, base: number): Float64Array {
  let cum = ss.cumulative.get(base);
  if (!cum) {
    cum = accumulateExtremes(ss.temperatures.tmin, ss.temperatures.tmax, { ...windowDegreeDayMethod, lower: base });
    ss.cumulative.set(base, cum);
  }
  return cum;
}

// ---- Preparing a rule's window ----

type Words = (text: string) => string;
const asWritten: Words = (text) => text;

// Windows prepared per site repeat the same few date shifts and rewordings thousands of times;
// remembering them keeps the per-site work small.
const shiftMemo = new Map<string, IsoDate>();
function shiftDate(date: IsoDate, days: number): IsoDate {
  const key = `${date}${days}`;
  let out = shiftMemo.get(key);
  if (out === undefined) {
    out = addDays(date, days);
    shiftMemo.set(key, out);
  }
  return out;
}

const boundMemo = new Map<string, IsoDate>();
function boundOn(bound: CalendarBound, season: number, hemisphere: Hemisphere): IsoDate {
  const key = `${season}${hemisphere}${bound.yearOffset}/${bound.month}/${bound.day}`;
  let out = boundMemo.get(key);
  if (out === undefined) {
    out = calendarDate(bound, season, hemisphere);
    boundMemo.set(key, out);
  }
  return out;
}

const southernMemo = new Map<string, string>();
const southernWords: Words = (text) => {
  let out = southernMemo.get(text);
  if (out === undefined) {
    out = southernMonthWords(text);
    southernMemo.set(text, out);
  }
  return out;
};

function triggerText(outcome: TriggerOutcome, normalsLabel: string, words: Words): string {
  const { trigger, reachedOn, date } = outcome;
  const cue = { reached: words(trigger.cue.reached), expected: words(trigger.cue.expected) };
  const total = `${trigger.degreeDays} degree-days since ${formatDay(outcome.since)} (base ${trigger.base} °C)`;
  if (!reachedOn) return `${cue.expected} by ${formatDay(date)} at the latest, the latest usual date: ${total} are not reached by then at this site`;
  const guard = date > reachedOn ? `; held to ${formatDay(date)}, the earliest usual date` : '';
  if (outcome.basis === 'readings') return `${cue.reached}: ${total}, reached on ${formatDay(reachedOn)}${guard}`;
  return `${cue.expected} around ${formatDay(reachedOn)}, when ${total} should be reached (projected from ${normalsLabel})${guard}`;
}

function boundDate(bound: OpenBound | CalendarBound | DegreeDayTrigger, ss: SiteSeason | null, season: number, hemisphere: Hemisphere): { date: IsoDate; outcome?: TriggerOutcome } {
  if (bound.kind === 'date') return { date: boundOn(bound, season, hemisphere) };
  if (!ss) throw new Error(`The degree-day trigger ${bound.id} needs a site.`);
  const outcome = triggerOutcome(ss, bound.id);
  return { date: outcome.date, outcome };
}

function closeDate(bound: CloseBound, opens: IsoDate, ss: SiteSeason | null, season: number, hemisphere: Hemisphere): { date: IsoDate; outcome?: TriggerOutcome } {
  if (bound.kind === 'after-opens') return { date: shiftDate(opens, bound.days) };
  const closes = boundDate(bound, ss, season, hemisphere);
  // A late trigger can push the opening past a fixed close: keep at least a week to do the job.
  return closes.date < opens ? { ...closes, date: shiftDate(opens, CLOSING_DAYS - 1) } : closes;
}

// A rule's citation is the same at every site: build the text once.
const sourceText = new WeakMap<TaskRule, string>();

function mergedSources(rule: TaskRule, outcomes: TriggerOutcome[]): string {
  let text = sourceText.get(rule);
  if (text === undefined) {
    const labels = new Set<SourceLabel>(rule.source);
    for (const o of outcomes) for (const label of o.trigger.source) labels.add(label);
    text = cite([...labels]);
    sourceText.set(rule, text);
  }
  return text;
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
  const words = hemisphere === 'south' ? southernWords : asWritten;
  const ruleReason = words(rule.reason);
  const reason = open.outcome
    ? `${triggerText(open.outcome, normalsLabel, words)}. ${ruleReason}.`
    : close.outcome ? `${ruleReason}. ${triggerText(close.outcome, normalsLabel, words)}.` : `${ruleReason}.`;
  const first = outcomes[0];
  const base: Omit<Window, 'state'> = {
    task: rule.task, key: rule.key, opens: open.date, closes: close.date, basis: windowBasis(outcomes),
    source: mergedSources(rule, outcomes), reason,
    ...(rule.detail ? { detail: words(rule.detail) } : {}),
    // Frozen because every plant's window shares this object with the cached base.
    ...(first ? { triggeredBy: Object.freeze({ degreeDays: first.trigger.degreeDays, base: first.trigger.base, since: first.since, ...(first.reachedOn ? { reachedOn: first.reachedOn } : {}) }) } : {}),
  };
  return { rule, forms: formSetOf(rule), base, closingFrom: shiftDate(close.date, 1 - CLOSING_DAYS) };
}

const formSets = new WeakMap<TaskRule, ReadonlySet<PlantForm>>();
function formSetOf(rule: TaskRule): ReadonlySet<PlantForm> {
  let set = formSets.get(rule);
  if (!set) {
    set = new Set(plantForms.filter((form) => formMatches(rule.forms, form)));
    formSets.set(rule, set);
  }
  return set;
}

const usesDegreeDays = (rule: TaskRule): boolean => rule.opens.kind === 'degree-days' || rule.closes.kind === 'degree-days';
const byOpening = (a: PreparedWindow, b: PreparedWindow): number => (a.base.opens < b.base.opens ? -1 : a.base.opens > b.base.opens ? 1 : 0);
const siteRules = new Map<PlantTypeCode, TaskRule[]>(plantTypeCodes.map((code) => [code, catalogue[code].rules.filter(usesDegreeDays)]));

// Calendar-only windows are the same for every site in a hemisphere, so they are prepared once per
// (season, hemisphere, type) for the whole process; only degree-day windows are prepared per site.
const calendarMaps = new Map<string, Map<string, PreparedWindow[]>>();

function calendarMap(season: number, hemisphere: Hemisphere): Map<string, PreparedWindow[]> {
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

function preparedFor(type: PlantTypeCode, ss: SiteSeason): PreparedWindow[] {
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

// ---- Choosing the rules for a plant ----

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
  const cum = cumulativeDegreeDays(ss, base);
  const start = ss.temperatures.start;
  const a = Math.max(0, daysBetween(start, since));
  const b = Math.min(cum.length - 1, daysBetween(start, through));
  if (b < a) return 0;
  return (cum[b] as number) - (a > 0 ? (cum[a - 1] as number) : 0);
}
