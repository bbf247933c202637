import type { HealthFlag, PlantForm, PlantGroup, PlantTypeCode } from '../../schemas/catalogue';
import type { SourceLabel } from '../sources';
import type { TaskCode } from './tasks';

// The shapes of the catalogue: a plant type's profile and the rules its care windows come from.
//
// Calendar bounds are written for the northern hemisphere (UK lowland timings, as the reference
// gives them); the windows shift them six months for southern sites. A bound with yearOffset −1
// falls in the autumn before the season: dormant-season work belongs to the season whose growth
// it prepares, so a season's winter pruning opens the previous November. A bound on a month's
// last day means the end of the month (29 February is the end of February in any year).

export interface MonthDay {
  month: number;
  day: number;
}

export interface CalendarBound extends MonthDay {
  kind: 'date';
  yearOffset: -1 | 0;
}

export interface DegreeDayTrigger {
  kind: 'degree-days';
  /** Shared by every rule using the same trigger, so a site resolves it once. */
  id: string;
  degreeDays: number;
  base: number;
  /** A biofix; the season's start (1 January, 1 July in the south) when absent. */
  from?: MonthDay;
  /** Calendar guard rails: a trigger reached earlier opens on `earliest`; never reached, on `latest`. */
  earliest: MonthDay;
  latest: MonthDay;
  source: readonly SourceLabel[];
  /** The stage in the grower's words, once reached and while still expected. */
  cue: { reached: string; expected: string };
  /** For derived totals: the published date the total stands for under the default normals. */
  calibratedTo?: MonthDay;
}

export interface AfterOpens {
  kind: 'after-opens';
  days: number;
}

export type OpenBound = CalendarBound | DegreeDayTrigger;
export type CloseBound = CalendarBound | DegreeDayTrigger | AfterOpens;

export type FormCondition = 'trained' | 'free-standing' | readonly PlantForm[];
export type AgeCondition = 'formative' | 'established';

export interface TaskRule {
  /** Unique within a type; stable, so reminders can key on it. */
  key: string;
  task: TaskCode;
  opens: OpenBound;
  closes: CloseBound;
  forms?: FormCondition;
  age?: AgeCondition;
  /** The rule applies only when the plant carries one of these flags. */
  health?: readonly HealthFlag[];
  source: readonly SourceLabel[];
  reason: string;
  detail?: string;
}

export type ChillMeasure = 'chill-hours' | 'chill-portions' | 'hours-below-7c';

export interface ChillNeed {
  measure: ChillMeasure;
  min: number;
  max: number;
  source: readonly SourceLabel[];
  note?: string;
}

export interface PlantTypeProfile {
  code: PlantTypeCode;
  group: PlantGroup;
  degreeDayBase: { celsius: number; source: readonly SourceLabel[] };
  chill: readonly ChillNeed[];
  /** Seasons after planting (season − planted year) that count as formative. */
  formativeYears: number;
  rules: readonly TaskRule[];
}
