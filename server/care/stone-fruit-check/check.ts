import { plantTypeCodes, plantTypeLabels, type PlantTypeCode } from '../../schemas/catalogue';
import { catalogue } from '../catalogue';
import { addDays, hemisphereOf, isIsoDate, southernMonthWords, type IsoDate } from '../dates';
import { CareInputError } from '../errors';
import { northernEquivalent } from './calendar';
import { dayRules, fired, notes, wetRule, worst, type Context } from './rules';
import type { StoneFruitCutCheck, StoneFruitCutInput } from './types';

// The check itself: the input is checked, the day's rules fired, and the nearest run of safe days
// found by asking the same rules about the days that follow.

/** Trees up to this many years after planting get formative pruning (care-rules.md PR-4: years 1–3). */
export const FORMATIVE_MAX_AGE = 3;

function nearestSafe(ctx: Context, from: IsoDate, latitude: number): { from: IsoDate; to: IsoDate } | undefined {
  const isOk = (date: IsoDate) => worst(dayRules(ctx, northernEquivalent(date, latitude))) === 'ok';
  let i = 0;
  while (i <= 366 && !isOk(addDays(from, i))) i++;
  if (i > 366) return undefined;
  let j = i;
  while (j - i <= 366 && isOk(addDays(from, j + 1))) j++;
  return { from: addDays(from, i), to: addDays(from, j) };
}

function checkInput(input: StoneFruitCutInput): void {
  if (!(plantTypeCodes as readonly string[]).includes(input.type)) throw new CareInputError('Choose a plant type from the catalogue.', 'type');
  if (!isIsoDate(input.date)) throw new CareInputError('Use the form YYYY-MM-DD for the date.', 'date');
  if (!Number.isFinite(input.latitude) || Math.abs(input.latitude) > 90) throw new CareInputError('Latitude runs from -90 to 90.', 'latitude');
  if (input.ageYears !== undefined && !(Number.isFinite(input.ageYears) && input.ageYears >= 0)) throw new CareInputError('Age must be a number of years, 0 or more.', 'ageYears');
}

export function isStoneFruit(type: PlantTypeCode): boolean {
  return catalogue[type].group === 'stone';
}

export function checkStoneFruitCut(input: StoneFruitCutInput): StoneFruitCutCheck {
  checkInput(input);
  if (!isStoneFruit(input.type)) {
    const message = `${plantTypeLabels[input.type]} is not stone fruit, so the stone-fruit check does not apply: prune it in its own window.`;
    return { applies: false, verdict: 'ok', rules: [fired('NOT-STONE', 'note', message, ['S3', 'S18', 'S26'])] };
  }
  const ctx: Context = {
    type: input.type,
    isYoung: input.ageYears !== undefined && input.ageYears <= FORMATIVE_MAX_AGE,
    profile: input.profile ?? 'uk',
    symptoms: input.symptoms ?? [],
  };
  const x = northernEquivalent(input.date, input.latitude);
  const rules = dayRules(ctx, x);
  if (input.wet) rules.push(wetRule(ctx.profile));
  const verdict = worst(rules);
  rules.push(...notes(ctx, x, verdict));
  // A wet day is judged on the weather; the next safe window then starts tomorrow at the earliest.
  const nextSafe = nearestSafe(ctx, input.wet ? addDays(input.date, 1) : input.date, input.latitude);
  // The messages name northern months; a southern grower reads them six months on.
  const worded = hemisphereOf(input.latitude) === 'south' ? rules.map((r) => ({ ...r, message: southernMonthWords(r.message) })) : rules;
  return nextSafe ? { applies: true, verdict, rules: worded, nextSafe } : { applies: true, verdict, rules: worded };
}
