import { LADDER_DAYLIGHT_MARGIN_MINUTES } from './daylight';
import { CareInputError } from './errors';

// Ladder arithmetic from safety.md §1. The UK "1 in 4" rule (HSE INDG455/INDG403) sets the foot
// one unit out for every four units up; the US rule (OSHA 29 CFR 1926.1053(b)(5)(i)) takes a
// quarter of the length along the ladder instead. They differ by under half a degree. planLadder
// uses the UK rule; the US helpers are here for growers who follow OSHA.
//
// Nothing here promises a safe job: the numbers are targets to set up by, and the text says so.

const SQRT17_OVER_4 = Math.sqrt(17) / 4;
const FEET_PER_METRE = 1 / 0.3048;
const POUNDS_PER_KG = 2.204_622_6;

/** atan(4) ≈ 75.96°, which HSE rounds to "75°". */
export const ONE_IN_FOUR_ANGLE_DEG = (Math.atan(4) * 180) / Math.PI;
/** acos(1/4) ≈ 75.52° for the OSHA quarter-of-working-length rule. */
export const US_LADDER_ANGLE_DEG = (Math.acos(0.25) * 180) / Math.PI;

/** Rung pitch and shoulder height for an average adult: design assumptions (safety.md §1.3, label c). */
export const DEFAULT_RUNG_PITCH_M = 0.28;
export const DEFAULT_SHOULDER_HEIGHT_M = 1.4;

/**
 * Feet above 3.0 m is band H in safety.md §7, where the work goes to an arborist or a platform
 * (a design choice, label c). A leaning ladder resting at this height puts the feet on the highest
 * standing rung (three rungs below the top) at 3.0 m, so a higher support is the wrong tool.
 */
export const LEANING_LADDER_MAX_SUPPORT_M = 3.0 + 3 * DEFAULT_RUNG_PITCH_M * Math.sin(Math.atan(4));

/** HSE INDG455/INDG403 guide figures for a ladder job: short (30 min in one position) and light (10 kg). */
export const LADDER_MAX_MINUTES_IN_ONE_POSITION = 30;
export const LADDER_MAX_CARRIED_KG = 10;
/** Washington WAC 296-307-05505 prohibits orchard ladders longer than 16 ft. */
export const TRIPOD_MAX_LENGTH_FT = 16;

function round2(x: number): number {
  return Math.round(x * 100) / 100;
}

function positive(value: number, path: string): number {
  if (!Number.isFinite(value) || value <= 0) throw new CareInputError('Give a height greater than zero.', path);
  return value;
}

function wholeCount(value: number, path: string): number {
  if (!Number.isInteger(value) || value < 1) throw new CareInputError('Give a whole number of rungs or steps.', path);
  return value;
}

/** UK 1-in-4: distance from the foot of the ladder to the base of the support. */
export function footDistance(supportHeight: number): number {
  return positive(supportHeight, 'supportHeight') / 4;
}

/** Length along the stiles from the foot to the resting point at 1 in 4. */
export function lengthToSupport(supportHeight: number): number {
  return positive(supportHeight, 'supportHeight') * SQRT17_OVER_4;
}

/**
 * Length needed to step off onto a landing at `landingHeight` with `extension` above it (HSE: at
 * least 1 m). Guidance does not say how the extension is measured; vertical is the longer answer.
 */
export function accessLength(landingHeight: number, extension: number, measured: 'vertical' | 'along-stiles' = 'vertical'): number {
  positive(landingHeight, 'landingHeight');
  return measured === 'vertical' ? (landingHeight + extension) * SQRT17_OVER_4 : landingHeight * SQRT17_OVER_4 + extension;
}

/** OSHA: the foot sits a quarter of the working length out. */
export function usFootDistance(workingLength: number): number {
  return positive(workingLength, 'workingLength') / 4;
}

/** OSHA: rails at least 3 ft above the landing, measured along the rails. */
export function usAccessLength(landingHeight: number, extensionAlongRails = 3): number {
  return (4 * positive(landingHeight, 'landingHeight')) / Math.sqrt(15) + extensionAlongRails;
}

/** Highest rung to stand on (1 = lowest): the top three rungs of a leaning ladder are handholds. */
export function maxStandingRung(rungs: number): number {
  return Math.max(0, wholeCount(rungs, 'rungs') - 3);
}

/** UK stepladder: not the top two treads, or the top three on swing-back steps whose top is a tread. */
export function maxStepladderTread(treads: number, hasSwingBackTopTread = false): number {
  return Math.max(0, wholeCount(treads, 'treads') - (hasSwingBackTopTread ? 3 : 2));
}

/** Tripod orchard ladder: not the top cap or the step below it (the cap counts as a step). */
export function maxTripodStep(steps: number): number {
  return Math.max(0, wholeCount(steps, 'steps') - 2);
}

export function isTripodLengthAllowed(lengthFt: number): boolean {
  return positive(lengthFt, 'lengthFt') <= TRIPOD_MAX_LENGTH_FT;
}

export function isLadderDurationOk(minutesInOnePosition: number): boolean {
  return minutesInOnePosition <= LADDER_MAX_MINUTES_IN_ONE_POSITION;
}

export function isLadderCarryOk(carriedKg: number): boolean {
  return carriedKg <= LADDER_MAX_CARRIED_KG;
}

export type LadderRating = 'III' | 'II' | 'I' | 'IA' | 'IAA' | 'EN131';

// ANSI A14 duty ratings in lb (safety.md S7, secondary); EN 131's 150 kg is from memory (label c).
const RATING_LB: Record<LadderRating, number> = { III: 200, II: 225, I: 250, IA: 300, IAA: 375, EN131: 150 * POUNDS_PER_KG };

/** Person, clothing, tools and a full picking bag against the ladder's marked maximum load. */
export function isWithinLoadRating(totalKg: number, rating: LadderRating): boolean {
  return totalKg * POUNDS_PER_KG <= RATING_LB[rating];
}

/** Height of the feet on `rung` of a leaning ladder at 1 in 4. */
export function standingHeight(rung: number, rungPitchM = DEFAULT_RUNG_PITCH_M): number {
  return rung * rungPitchM * Math.sin(Math.atan(4));
}

/**
 * Length along the stiles for hands to work at `workHeight`: feet at work height less shoulder
 * height, plus the three top rungs kept as handholds.
 */
export function ladderLengthForWorkHeight(workHeight: number, shoulderHeight = DEFAULT_SHOULDER_HEIGHT_M, rungPitchM = DEFAULT_RUNG_PITCH_M): number {
  const restingHeight = positive(workHeight, 'workHeight') - shoulderHeight + standingHeight(3, rungPitchM);
  return Math.max(0, restingHeight) * SQRT17_OVER_4;
}

const CLOCK = /^(\d{2}):(\d{2})$/;
const ISO_WITH_OFFSET = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(?::\d{2})?(Z|[+-]\d{2}:\d{2})$/;

/**
 * The time ladder and cutting work should be finished by, `minutes` (30) before sunset: the
 * clock-reading twin of daylight()'s finishLadderWorkBy. Takes "19:42" or an ISO time with its
 * offset, and answers in the same form and offset.
 */
export function finishWorkBy(sunset: string, minutes = LADDER_DAYLIGHT_MARGIN_MINUTES): string {
  const clock = CLOCK.exec(sunset);
  if (clock) {
    const total = (((Number(clock[1]) * 60 + Number(clock[2]) - minutes) % 1440) + 1440) % 1440;
    return `${String(Math.floor(total / 60)).padStart(2, '0')}:${String(total % 60).padStart(2, '0')}`;
  }
  const iso = ISO_WITH_OFFSET.exec(sunset);
  if (!iso) throw new CareInputError('Give the sunset as HH:MM or an ISO time with its offset.', 'sunset');
  const offset = iso[1] === 'Z' ? '+00:00' : (iso[1] as string);
  const offsetMinutes = (offset.startsWith('-') ? -1 : 1) * (Number(offset.slice(1, 3)) * 60 + Number(offset.slice(4, 6)));
  const local = new Date(Date.parse(sunset) + (offsetMinutes - minutes) * 60_000);
  return `${local.toISOString().slice(0, 19)}${offset}`;
}

function formatLength(metres: number, unit: 'm' | 'ft'): string {
  return unit === 'm' ? `${round2(metres).toFixed(2)} m` : `${(metres * FEET_PER_METRE).toFixed(1)} ft`;
}

export interface LadderPlan {
  footDistanceM: number;
  ladderLengthM: number;
  angleDeg: number;
  highestRungNote: string;
  cautions: string[];
}

/**
 * How to set a leaning ladder against a support at `supportHeightM` metres. Numbers stay in
 * metres; `unit` only chooses how lengths are written in the notes.
 */
export function planLadder(supportHeightM: number, options: { unit?: 'm' | 'ft' } = {}): LadderPlan {
  const height = positive(supportHeightM, 'supportHeightM');
  const unit = options.unit ?? 'm';
  const foot = footDistance(height);
  const length = lengthToSupport(height);
  const stepOff = unit === 'm' ? '1 m' : '3 ft';
  const cautions = [
    `Set the foot about ${formatLength(foot, unit)} out from the base of the support: one out for every four up (about 75°).`,
    `Choose a ladder longer than ${formatLength(length, unit)} so its top reaches well past the resting point, and round up to the next size.`,
    'Stand the feet on firm, level ground with the rungs level. Never prop them on bricks, pots or boxes.',
    'Soft or sloping ground? Use a tripod orchard ladder or a levelling device, or have someone foot the ladder.',
    'Rest it on the trunk or a sound main limb, never the branch you are cutting: a limb springs up when weight comes off.',
    'Keep three points of contact when climbing and carry tools on a belt.',
    'Ladders suit short, light jobs: about 30 minutes in one position and under 10 kg carried.',
    'Loppers, two-handed saws, pole saws and chainsaws are not for use from a ladder.',
    'Overhead lines near the tree? Keep the ladder well clear and call the electricity network operator; leave line-side cuts to a qualified line-clearance arborist.',
    `Finish ladder work at least ${LADDER_DAYLIGHT_MARGIN_MINUTES} minutes before sunset.`,
  ];
  if (height > LEANING_LADDER_MAX_SUPPORT_M) {
    cautions.unshift(
      `A support above about ${formatLength(LEANING_LADDER_MAX_SUPPORT_M, unit)} puts your feet over 3 m up: a leaning ladder is the wrong tool. Use pole tools from the ground, a platform, or book a qualified arborist.`,
    );
  }
  return {
    footDistanceM: round2(foot),
    ladderLengthM: round2(length),
    angleDeg: round2(ONE_IN_FOUR_ANGLE_DEG),
    highestRungNote: `Don't stand on the top three rungs: keep them as handholds. Keep your hips between the stiles and climb down to move the ladder rather than lean out. Stepping off onto a platform? The ladder must reach at least ${stepOff} above it. Never step off into the tree.`,
    cautions,
  };
}
