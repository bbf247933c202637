import { describe, expect, it } from 'vitest';
import { CareInputError } from '../../server/care/degree-days';
import {
  LEANING_LADDER_MAX_SUPPORT_M,
  ONE_IN_FOUR_ANGLE_DEG,
  US_LADDER_ANGLE_DEG,
  accessLength,
  finishWorkBy,
  footDistance,
  isLadderCarryOk,
  isLadderDurationOk,
  isTripodLengthAllowed,
  isWithinLoadRating,
  ladderLengthForWorkHeight,
  lengthToSupport,
  maxStandingRung,
  maxStepladderTread,
  maxTripodStep,
  planLadder,
  standingHeight,
  usAccessLength,
  usFootDistance,
} from '../../server/care/ladder';

describe('planLadder', () => {
  it('sets a 3 m support 0.75 m out with 3.09 m of ladder at 75.96°', () => {
    // HSE INDG455 (2014) / INDG403 1-in-4 rule, safety.md §1.1 worked numbers and §8 T01, T03, T04
    const plan = planLadder(3);
    expect(plan.footDistanceM).toBe(0.75);
    expect(plan.ladderLengthM).toBe(3.09);
    expect(plan.angleDeg).toBe(75.96);
  });

  it('sets a 4 m support 1.00 m out with 4.12 m of ladder', () => {
    // HSE INDG455 (2014) 1-in-4 rule, safety.md §1.1 worked numbers and §8 T02
    expect(planLadder(4)).toMatchObject({ footDistanceM: 1, ladderLengthM: 4.12 });
    // safety.md §1.1 worked numbers: 2.4 m → 0.60 m out, 2.47 m along the stiles
    expect(planLadder(2.4)).toMatchObject({ footDistanceM: 0.6, ladderLengthM: 2.47 });
  });

  it('explains the highest rung in plain words', () => {
    // HSE INDG455 (2014): top three rungs, belt buckle inside the stiles, 1 m above a landing
    const note = planLadder(3).highestRungNote;
    expect(note).toMatch(/top three rungs/);
    expect(note).toMatch(/hips between the stiles/);
    expect(note).toMatch(/at least 1 m above/);
    expect(planLadder(3, { unit: 'ft' }).highestRungNote).toMatch(/at least 3 ft above/);
  });

  it('covers placement, footing, contact, tools, lines and daylight', () => {
    const text = planLadder(3).cautions.join('\n');
    expect(text).toMatch(/0\.75 m out/);
    expect(text).toMatch(/firm, level ground/);
    expect(text).toMatch(/three points of contact/);
    expect(text).toMatch(/chainsaws are not for use from a ladder/);
    expect(text).toMatch(/electricity network operator/);
    expect(text).toMatch(/qualified line-clearance arborist/);
    expect(text).toMatch(/30 minutes before sunset/);
    expect(text).not.toMatch(/\b(safe|guarantee)/i);
  });

  it('writes lengths in feet when asked, keeping the numbers in metres', () => {
    const plan = planLadder(3, { unit: 'ft' });
    expect(plan.footDistanceM).toBe(0.75);
    expect(plan.cautions[0]).toMatch(/2\.5 ft out/);
  });

  it('says a leaning ladder is the wrong tool once the feet would be over 3 m up', () => {
    // safety.md §6.1 and §7 band H: feet above 3.0 m defers to an arborist (design choice, label c)
    expect(LEANING_LADDER_MAX_SUPPORT_M).toBeCloseTo(3.815, 3);
    expect(planLadder(3.8).cautions[0]).not.toMatch(/wrong tool/);
    const high = planLadder(4);
    expect(high.cautions[0]).toMatch(/wrong tool/);
    expect(high.cautions[0]).toMatch(/qualified arborist/);
  });

  it('rejects a height that is not above zero', () => {
    expect(() => planLadder(0)).toThrow(CareInputError);
    expect(() => planLadder(Number.NaN)).toThrow(CareInputError);
  });
});

describe('ladder helpers (safety.md §8 check values)', () => {
  it('T01–T04: UK base, angle and length to the support', () => {
    // HSE INDG455 (2014) / INDG403 1-in-4 rule, safety.md §8 T01–T04
    expect(footDistance(3)).toBeCloseTo(0.75, 3);
    expect(footDistance(4)).toBeCloseTo(1.0, 3);
    expect(Math.abs(ONE_IN_FOUR_ANGLE_DEG - 75.96)).toBeLessThan(0.05);
    expect(Math.abs(lengthToSupport(3) - 3.092)).toBeLessThan(0.005);
  });

  it('T05: length to step off at 3 m with 1 m to spare', () => {
    // HSE INDG455 (2014) 1 m above the landing; Work at Height Regulations 2005 Sch 6; safety.md §8 T05
    expect(Math.abs(accessLength(3, 1) - 4.123)).toBeLessThan(0.005);
    expect(Math.abs(accessLength(3, 1, 'along-stiles') - 4.092)).toBeLessThan(0.005);
  });

  it('T06–T08: OSHA quarter-length rule', () => {
    // US OSHA 29 CFR 1926.1053(b)(5)(i) and (b)(1), safety.md §8 T06–T08
    expect(usFootDistance(20)).toBeCloseTo(5, 2);
    expect(Math.abs(US_LADDER_ANGLE_DEG - 75.52)).toBeLessThan(0.05);
    expect(Math.abs(usAccessLength(10) - 13.33)).toBeLessThan(0.01);
  });

  it('T09: stand no higher than rung 11 of a 14-rung ladder', () => {
    // HSE INDG455 (2014) top three rungs, safety.md §8 T09
    expect(maxStandingRung(14)).toBe(11);
    expect(maxStandingRung(3)).toBe(0);
    expect(() => maxStandingRung(2.5)).toThrow(CareInputError);
  });

  it('T10: stepladder treads, ordinary and swing-back', () => {
    // HSE INDG455 (2014) top two / top three steps, safety.md §8 T10
    expect(maxStepladderTread(6)).toBe(4);
    expect(maxStepladderTread(6, true)).toBe(3);
  });

  it('T11–T12: tripod orchard ladders', () => {
    // Washington State WAC 296-307-05505 (2020) and US OSHA tripod orchard ladder QuickCard, safety.md §8 T11–T12
    expect(maxTripodStep(10)).toBe(8);
    expect(isTripodLengthAllowed(18)).toBe(false);
    expect(isTripodLengthAllowed(16)).toBe(true);
  });

  it('T13–T14: short and light work', () => {
    // HSE INDG455 (2014) / INDG403 guide figures 30 minutes and 10 kg, safety.md §8 T13–T14
    expect(isLadderDurationOk(45)).toBe(false);
    expect(isLadderDurationOk(25)).toBe(true);
    expect(isLadderCarryOk(12)).toBe(false);
    expect(isLadderCarryOk(8)).toBe(true);
  });

  it('T15: 108 kg against the duty ratings', () => {
    // ANSI A14 duty ratings (secondary) and EN 131 150 kg (from memory, unverified), safety.md §8 T15
    expect(isWithinLoadRating(108, 'II')).toBe(false);
    expect(isWithinLoadRating(108, 'I')).toBe(true);
    expect(isWithinLoadRating(108, 'EN131')).toBe(true);
    expect(isWithinLoadRating(151, 'EN131')).toBe(false);
  });

  it('T31: rung 9 at 0.28 m pitch puts the feet about 2.44 m up', () => {
    // HSE INDG455 (2014) rule with rung pitch a design assumption, safety.md §8 T31
    expect(Math.abs(standingHeight(9) - 2.44)).toBeLessThan(0.05);
    expect(standingHeight(9, 0.3)).toBeGreaterThan(standingHeight(9));
  });

  it('T32: finish by 19:12 when the sun sets at 19:42', () => {
    // Design choice (safety.md §5, label c); chainsaw manufacturers' daylight rule (S16), safety.md §8 T32
    expect(finishWorkBy('19:42')).toBe('19:12');
    expect(finishWorkBy('00:10')).toBe('23:40');
    expect(finishWorkBy('2026-06-21T21:21:00+01:00')).toBe('2026-06-21T20:51:00+01:00');
    expect(finishWorkBy('2026-01-01T00:20:00-05:00')).toBe('2025-12-31T23:50:00-05:00');
    expect(() => finishWorkBy('sunset')).toThrow(CareInputError);
  });

  it('T33: hands at 3 m need about 2.49 m of ladder, foot about 0.60 m out', () => {
    // HSE INDG455 (2014) rules with shoulder height and rung pitch as design assumptions, safety.md §8 T33
    const length = ladderLengthForWorkHeight(3);
    expect(Math.abs(length - 2.49)).toBeLessThan(0.02);
    expect(Math.abs(length / Math.sqrt(17) - 0.6)).toBeLessThan(0.02);
  });
});
