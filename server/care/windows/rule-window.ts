import { plantForms, type PlantForm } from '../../schemas/catalogue';
import { formMatches, type CalendarBound, type CloseBound, type DegreeDayTrigger, type OpenBound, type TaskRule } from '../catalogue';
import { addDays, southernMonthWords, type Hemisphere, type IsoDate } from '../dates';
import { cite, type SourceLabel } from '../sources';
import { calendarDate, formatDay } from './calendar';
import { CLOSING_DAYS } from './state';
import { triggerOutcome } from './triggers';
import type { PreparedWindow, SiteSeason, TriggerOutcome, Window, WindowBasis } from './types';

// One rule's window worked out for a season: its dates, basis, reason and citation, before a plant
// and a day are known. Everything here is shared between plants, so none of it is ever changed.

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

export function prepare(rule: TaskRule, ss: SiteSeason | null, season: number, hemisphere: Hemisphere): PreparedWindow {
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
