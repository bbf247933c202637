import type { KeepTime, StoreItem, StoreMethod, StoreState } from '../schemas/store';
import { addDays, daysBetween, type IsoDate } from './dates';
import { cite, COMMON_PRACTICE, FROM_MEMORY, type SourceLabel } from './sources';

// How long stored produce keeps, by item and method, and the dates a batch gets from that: a warn
// date (use it soon) and a use-by date (past its best; check before eating). Each row names what it
// rests on, as the care rules do.

interface KeepRule { warnMonths: number; expireMonths: number; sources: SourceLabel[]; note: string }

/** Refused combinations: no tested way to do them safely at home. */
export class KeepingRefusal extends Error {}

// Frozen vine leaves: 6–12 months is common practice; MSU Extension (citing University of California
// Cooperative Extension) gives about 6 months (care-rules.md §4.5, S62). So warn at 6, expire at 12.
const vineLeavesFrozen: KeepRule = { warnMonths: 6, expireMonths: 12, sources: [COMMON_PRACTICE, 'S62'], note: 'Common practice says 6–12 months; a published extension source says about 6, so we warn at 6.' };

// Home-frozen fruit: 8–12 months at −18 °C is the usual guidance (recalled from the USDA National
// Center for Home Food Preservation's freezing notes; not re-checked, hence FROM_MEMORY).
const fruitFrozen: KeepRule = { warnMonths: 8, expireMonths: 12, sources: [FROM_MEMORY], note: 'Best within 8–12 months in a freezer at −18 °C.' };

// Dried fruit: about a year somewhere cool, less somewhere warm (recalled from the same centre's
// drying notes: roughly 1 year at 15 °C, 6 months at 27 °C). We warn at 6 months.
const fruitDried: KeepRule = { warnMonths: 6, expireMonths: 12, sources: [FROM_MEMORY], note: 'About a year somewhere cool and dark; half that somewhere warm.' };

// Home-bottled fruit: best within a year is common practice; after two we call it past use-by.
const fruitBottled: KeepRule = { warnMonths: 12, expireMonths: 24, sources: [COMMON_PRACTICE], note: 'Best within a year. Never eat from a jar whose seal has lifted.' };

// Anything we have no row for: a cautious default of ours, not a published figure.
const fallback: KeepRule = { warnMonths: 3, expireMonths: 6, sources: [COMMON_PRACTICE], note: 'No keep time is known for this; check it often.' };

const fruit = { frozen: fruitFrozen, dried: fruitDried, bottled: fruitBottled, other: fallback };

const table: Record<StoreItem, Partial<Record<StoreMethod, KeepRule>>> = {
  'vine-leaves': { frozen: vineLeavesFrozen },
  apples: fruit, pears: fruit, 'stone-fruit': fruit, 'soft-fruit': fruit, figs: fruit, grapes: fruit,
  other: { frozen: fruitFrozen, dried: fruitDried, bottled: fruitBottled, other: fallback },
};

// MSU Extension (S62): no research-tested method exists for canning grape leaves at home.
const refusals: Partial<Record<`${StoreItem}:${StoreMethod}`, string>> = {
  'vine-leaves:bottled': 'There is no tested way to bottle vine leaves safely at home (MSU Extension, “Preserving grape leaves”). Freeze them instead.',
};

export function keepRule(item: StoreItem, method: StoreMethod): KeepRule {
  const refusal = refusals[`${item}:${method}`];
  if (refusal) throw new KeepingRefusal(refusal);
  return table[item][method] ?? fallback;
}

/** Calendar months later, the day held where the month allows it (31 Aug + 6 months = 28 Feb). */
export function addMonths(date: IsoDate, months: number): IsoDate {
  const [y, m, d] = date.split('-').map(Number) as [number, number, number];
  const total = y * 12 + (m - 1) + months;
  const year = Math.floor(total / 12);
  const month = (total % 12) + 1;
  const lastDay = new Date(Date.UTC(year, month, 0)).getUTCDate();
  return `${String(year).padStart(4, '0')}-${String(month).padStart(2, '0')}-${String(Math.min(d, lastDay)).padStart(2, '0')}`;
}

export interface KeepDates { warnOn: IsoDate; useBy: IsoDate; source: string }

export function keepDates(item: StoreItem, method: StoreMethod, storedOn: IsoDate): KeepDates {
  const rule = keepRule(item, method);
  return { warnOn: addMonths(storedOn, rule.warnMonths), useBy: addMonths(storedOn, rule.expireMonths), source: cite(rule.sources) };
}

/** A batch's state on a day; the notice goes out NOTICE_DAYS before use-by. */
export function storeState(batch: { warnOn: IsoDate; useBy: IsoDate; usedOn: IsoDate | null }, on: IsoDate): StoreState {
  if (batch.usedOn) return 'used';
  if (on > batch.useBy) return 'past-use-by';
  return on >= batch.warnOn || daysBetween(on, batch.useBy) <= NOTICE_DAYS ? 'use-soon' : 'keeps';
}

export const NOTICE_DAYS = 7;
export const noticeDay = (useBy: IsoDate) => addDays(useBy, -NOTICE_DAYS);

/** The whole table, for the store page to show before a batch is saved. */
export function keepTimes(): KeepTime[] {
  return (Object.keys(table) as StoreItem[]).flatMap((item) =>
    (['frozen', 'dried', 'bottled', 'other'] as const).flatMap((method) => {
      if (refusals[`${item}:${method}`]) return [];
      const rule = table[item][method] ?? fallback;
      return [{ item, method, warnMonths: rule.warnMonths, expireMonths: rule.expireMonths, source: cite(rule.sources), note: rule.note }];
    }),
  );
}
