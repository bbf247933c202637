import type { HealthFlag, PlantForm, PlantTypeCode } from '../../schemas/catalogue';
import type { DegreeDayTrigger, TaskCode, TaskRule } from '../catalogue';
import type { Hemisphere, IsoDate } from '../dates';
import type { SeasonTemperatures } from '../projection';

// The shapes the window files pass between them and hand to callers. Kept in one place because
// every step (site season, triggers, a rule's window, a plant's windows) reads the same few.

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
