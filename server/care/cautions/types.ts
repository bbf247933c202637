// What a caller says about a piece of work, and the cautions it gets back.

export type CautionTask = 'prune' | 'thin' | 'feed' | 'spray' | 'harvest' | 'tie-in' | 'mulch' | 'pick-leaves' | 'pinch';
export type CautionTool =
  | 'secateurs' | 'loppers' | 'pruning-saw' | 'pole-saw' | 'hedge-trimmer' | 'chainsaw'
  | 'ladder' | 'sanitiser' | 'sprayer' | 'granular-feed' | 'liquid-feed' | 'knife';
export type HeightBand = 'ground' | 'low' | 'mid' | 'high';
export type CautionSeverity = 'info' | 'warn' | 'stop';

export interface Caution {
  code: string;
  text: string;
  source: string;
  severity: CautionSeverity;
}

export interface CautionInput {
  task: CautionTask;
  tools?: CautionTool[];
  /** Height of the grower's feet above the ground, in metres (the reference's bands are by feet). */
  heightM?: number | null;
  hazards?: string[];
  /** 1–12, calendar month of the work. */
  month?: number;
  plantType?: string;
  country?: 'UK' | 'US';
  /** Forecast heat index in °F and UV index, when the caller has them. */
  heatIndexF?: number;
  uvIndex?: number;
}
