import type { PlantTypeCode } from '../../schemas/catalogue';
import type { IsoDate } from '../dates';

// What the stone-fruit check is asked and what it answers.

export type StoneFruitSymptom = 'silver-leaf' | 'canker' | 'dead-wood';
export type StoneFruitProfile = 'uk' | 'us-north';
export type Verdict = 'ok' | 'caution' | 'avoid';
/** How one rule bears on the verdict; a note informs without changing it. */
export type RuleEffect = Verdict | 'note';

export interface StoneFruitCutInput {
  type: PlantTypeCode;
  date: IsoDate;
  latitude: number;
  ageYears?: number;
  wet?: boolean;
  symptoms?: readonly StoneFruitSymptom[];
  profile?: StoneFruitProfile;
}

export interface FiredRule {
  code: string;
  effect: RuleEffect;
  message: string;
  source: string;
}

export interface StoneFruitCutCheck {
  applies: boolean;
  verdict: Verdict;
  rules: FiredRule[];
  /** The nearest run of days a cut is ok, starting today when today is ok. */
  nextSafe?: { from: IsoDate; to: IsoDate };
}
