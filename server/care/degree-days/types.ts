import type { IsoDate } from '../dates';

// What the degree-day functions take: a day's extremes and the method, cutoff and thresholds.

export type DegreeDayMethod = 'average' | 'single-triangle' | 'double-triangle' | 'single-sine' | 'double-sine';
export type Cutoff = 'horizontal' | 'intermediate' | 'vertical';
export type TemperatureUnit = 'C' | 'F';

export interface DailyTemperature {
  date: IsoDate;
  tmin: number;
  tmax: number;
}

export interface DegreeDayOptions {
  method: DegreeDayMethod;
  /** Defaults to horizontal. Ignored by the average method, which only caps at `upper`. */
  cutoff?: Cutoff;
  lower: number;
  /** Leave out for no upper threshold (no cutoff). */
  upper?: number;
}
