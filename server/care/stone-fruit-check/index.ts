// Is a cut on stone fruit safe on a given day? The rules are those of care-rules.md §3 (PR-1 …
// PR-18 for the UK, US-1 … US-5 overriding them for the northern US). Silver leaf and bacterial
// canker get in through fresh wounds; their spores and bacteria are about from September to May,
// while summer wounds heal fast. Dates are judged by their northern-hemisphere equivalent, so a
// southern site gets the same answer six months later. This file is what `care/stone-fruit-check`
// means to the rest of the code.
export type {
  FiredRule, RuleEffect, StoneFruitCutCheck, StoneFruitCutInput, StoneFruitProfile, StoneFruitSymptom, Verdict,
} from './types';
export { checkStoneFruitCut, FORMATIVE_MAX_AGE, isStoneFruit } from './check';
