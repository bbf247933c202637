import type { z } from 'zod';
import {
  addDays, catalogue, checkStoneFruitCut, daylight, degreeDaysForDay, planLadder, seasonWindows,
  type DegreeDayOptions, type StoneFruitCutCheck,
} from '../care';
import type { PlantForm } from '../schemas/catalogue';
import type {
  CarePlanResponse, DaylightResponse, DegreeDaysResponse, LadderResponse, StoneFruitCheckResponse,
  carePlanRequestSchema, daylightQuerySchema, degreeDaysRequestSchema, ladderRequestSchema, stoneFruitCheckRequestSchema,
} from '../schemas/tools';

// The public tools: stateless arithmetic on the care engine, nothing stored. Inputs arrive parsed
// by the shared schemas; anything the engine still refuses throws CareInputError, which the error
// handler answers as a 400 with the engine's path.

type DegreeDaysInput = z.output<typeof degreeDaysRequestSchema>;
type StoneFruitInput = z.output<typeof stoneFruitCheckRequestSchema>;
type LadderInput = z.output<typeof ladderRequestSchema>;
type CarePlanInput = z.output<typeof carePlanRequestSchema>;
type DaylightInput = z.output<typeof daylightQuerySchema>;

const round2 = (x: number) => Math.round(x * 100) / 100;

/**
 * Days are answered in date order whatever order they came in, because a running total only means
 * something in time order. The double methods take the next calendar day's minimum as the next
 * morning's; where that day is missing (the last day, or a gap) the day's own minimum stands in,
 * as the published calculators do for the last day of a series.
 */
export function degreeDays(input: DegreeDaysInput): DegreeDaysResponse {
  const options: DegreeDayOptions = { method: input.method, cutoff: input.cutoff, lower: input.lower, ...(input.upper !== undefined ? { upper: input.upper } : {}) };
  const minByDate = new Map(input.days.map((d) => [d.date, d.tmin]));
  const sorted = [...input.days].sort((a, b) => (a.date < b.date ? -1 : a.date > b.date ? 1 : 0));
  let running = 0;
  const days = sorted.map((day) => {
    const dd = degreeDaysForDay(day.tmin, day.tmax, minByDate.get(addDays(day.date, 1)), options);
    running += dd;
    return { date: day.date, dd: round2(dd), cumulative: round2(running) };
  });
  return { total: round2(running), days };
}

/** The engine's answer in the contract's shape, each rule keeping its effect for the page's colours. */
export function toStoneFruitResponse(check: StoneFruitCutCheck): StoneFruitCheckResponse {
  return {
    applies: check.applies,
    verdict: check.verdict,
    rules: check.rules.map(({ code, message, source, effect }) => ({ code, message, source, effect })),
    ...(check.nextSafe ? { nextSafe: check.nextSafe } : {}),
  };
}

export function stoneFruitCheck(input: StoneFruitInput): StoneFruitCheckResponse {
  return toStoneFruitResponse(checkStoneFruitCut({ ...input, profile: input.profile ?? 'uk' }));
}

export function ladder(input: LadderInput): LadderResponse {
  const { footDistanceM, ladderLengthM, angleDeg, highestRungNote, cautions } = planLadder(input.supportHeightM, { unit: input.unit ?? 'm' });
  return { footDistanceM, ladderLengthM, angleDeg, highestRungNote, cautions };
}

/** A form that fits the usual way each group is grown, so a plan without one still has its rules. */
function usualForm(type: CarePlanInput['type']): PlantForm {
  const group = catalogue[type].group;
  return group === 'vine' ? 'vine-rod-and-spur' : group === 'cane' ? 'cane-row' : 'bush';
}

/** `today` is the caller's: the route decides what today is, never the engine. */
export function carePlan(input: CarePlanInput, today: string): CarePlanResponse {
  const windows = seasonWindows({
    plant: { typeCode: input.type, form: input.form ?? usualForm(input.type), plantedYear: input.plantedYear ?? null },
    site: { latitude: input.latitude, longitude: input.longitude },
    season: input.season,
    on: input.on ?? today,
    ...(input.days ? { readings: input.days } : {}),
  });
  return { windows: windows.map(({ task, opens, closes, state, basis, source, reason }) => ({ task, opens, closes, state, basis, source, reason })) };
}

export function daylightOn(input: DaylightInput, today: string): DaylightResponse {
  const d = daylight(input.lat, input.lon, input.date ?? today, input.tz);
  return { sunrise: d.sunrise, sunset: d.sunset, civilDusk: d.civilDusk, dayLengthMinutes: d.dayLengthMinutes, finishLadderWorkBy: d.finishLadderWorkBy };
}
