import { degreeDayTriggers, type DegreeDayTrigger } from '../catalogue';
import { daysBetween, type IsoDate } from '../dates';
import { accumulateExtremes, type DegreeDayOptions } from '../degree-days';
import { CareInputError } from '../errors';
import { seasonDateList, type SeasonTemperatures } from '../projection';
import { calendarDate } from './calendar';
import type { SiteSeason, TriggerOutcome } from './types';

// When each degree-day trigger is reached at one site in one season. A base's degree-days are
// accumulated, and all of that base's triggers resolved, the first time a plant needs one of them,
// so a site without apples or vines never pays for their triggers.

/**
 * Single sine (Baskerville & Emin 1969) with no upper threshold: the method of the published
 * sweet-cherry bloom model (S51). Every trigger uses it, the derived totals included, so that they
 * agree with one another; the UMass green-tip rule (S49) does not name its method.
 */
export const windowDegreeDayMethod: Omit<DegreeDayOptions, 'lower'> = { method: 'single-sine' };

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
