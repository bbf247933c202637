import { FROM_MEMORY, type SourceLabel } from '../sources';
import type { TaskCode } from './tasks';
import type { AfterOpens, CalendarBound, ChillNeed, CloseBound, OpenBound, TaskRule } from './types';

// Short builders, so each plant group's file states only the facts that differ between rules.

export const d = (month: number, day: number, yearOffset: -1 | 0 = 0): CalendarBound => ({ kind: 'date', month, day, yearOffset });
export const after = (days: number): AfterOpens => ({ kind: 'after-opens', days });
type Extra = Pick<TaskRule, 'forms' | 'age' | 'health' | 'detail'>;

export function rule(key: string, task: TaskCode, opens: OpenBound, closes: CloseBound, source: readonly SourceLabel[], reason: string, extra: Extra = {}): TaskRule {
  return { key, task, opens, closes, source, reason, ...extra };
}

// Harvest dates vary with cultivar and year; the ones in the catalogue are remembered, not published.
export function harvest(opens: CalendarBound, closes: CalendarBound, reason: string, detail?: string): TaskRule {
  return rule('harvest', 'harvest', opens, closes, [FROM_MEMORY], reason, detail ? { detail } : {});
}
export const hours = (min: number, max: number, source: readonly SourceLabel[] = [FROM_MEMORY], note?: string): ChillNeed => ({ measure: 'chill-hours', min, max, source, ...(note ? { note } : {}) });
export const portions = (min: number, max: number): ChillNeed => ({ measure: 'chill-portions', min, max, source: ['S40'] });
