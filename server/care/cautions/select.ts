import { CareInputError } from '../errors';
import { heatBand } from './heat';
import { heightBandFor } from './heights';
import { RULES, type Context } from './rules';
import { describeSources } from './safety-sources';
import { toolsFor } from './tools';
import type { Caution, CautionInput, CautionSeverity } from './types';

// Choosing the cautions for a piece of work: the input is turned into one context, every rule in
// the table is asked whether it applies, and the answers are ordered most serious first.

const SEVERITY_ORDER: Record<CautionSeverity, number> = { stop: 0, warn: 1, info: 2 };

function contextFor(input: CautionInput): Context {
  const tools = new Set(input.tools ?? toolsFor(input.task, input.heightM));
  // Without a height, a ladder in the kit means someone is off the ground: assume the middle band.
  const band = input.heightM == null ? (tools.has('ladder') ? 'mid' : 'ground') : heightBandFor(input.heightM);
  if (input.month !== undefined && !(Number.isInteger(input.month) && input.month >= 1 && input.month <= 12)) {
    throw new CareInputError('The month runs from 1 to 12.', 'month');
  }
  return {
    task: input.task,
    tools,
    band: band === 'ground' && tools.has('ladder') ? 'low' : band,
    hazards: new Set(input.hazards ?? []),
    month: input.month,
    plantType: input.plantType,
    country: input.country,
    heat: input.heatIndexF === undefined ? undefined : heatBand(input.heatIndexF),
    uvIndex: input.uvIndex,
  };
}

/** The cautions for a piece of work, most serious first. */
export function cautionsFor(input: CautionInput): Caution[] {
  const context = contextFor(input);
  return RULES.filter((rule) => rule.when(context))
    .map((rule) => ({
      code: rule.code,
      text: typeof rule.text === 'string' ? rule.text : rule.text(context),
      source: describeSources(rule.sources),
      severity: rule.severity,
    }))
    .sort((a, b) => SEVERITY_ORDER[a.severity] - SEVERITY_ORDER[b.severity]);
}
