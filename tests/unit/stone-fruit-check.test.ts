import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { plantTypeCodes, type PlantTypeCode } from '../../server/schemas/catalogue';
import { checkStoneFruitCut, isStoneFruit, type StoneFruitCutInput, type StoneFruitCutCheck } from '../../server/care/stone-fruit-check';
import { CareInputError } from '../../server/care/degree-days';
import { addDays } from '../../server/care/dates';

const UK = 52;
const STONE = plantTypeCodes.filter(isStoneFruit);
const ESTABLISHED = 12;

function check(type: PlantTypeCode, date: string, extra: Partial<StoneFruitCutInput> = {}): StoneFruitCutCheck {
  return checkStoneFruitCut({ type, date, latitude: UK, ageYears: ESTABLISHED, ...extra });
}
const codes = (result: StoneFruitCutCheck) => result.rules.map((r) => r.code);
const messageOf = (result: StoneFruitCutCheck, code: string) => result.rules.find((r) => r.code === code)?.message ?? '';

describe('scope', () => {
  it('covers plums, gages, damsons, cherries, peaches, nectarines and apricots', () => {
    expect(STONE).toEqual(['plum', 'gage', 'damson', 'cherry-sweet', 'cherry-sour', 'peach', 'nectarine', 'apricot']);
  });

  it.each(['apple', 'pear', 'fig', 'grape', 'blackcurrant', 'raspberry-summer'] as const)('does not apply to %s', (type) => {
    const result = check(type, '2025-01-15');
    expect(result.applies).toBe(false);
    expect(result.verdict).toBe('ok');
    expect(codes(result)).toEqual(['NOT-STONE']);
    expect(result.rules[0]?.message).toMatch(/does not apply/);
    expect(result.nextSafe).toBeUndefined();
  });
});

describe('UK profile (RHS silver leaf and bacterial canker profiles, S1, S2)', () => {
  // RHS, "Silver leaf" disease profile (S1): infectious spores September to May (care-rules.md §9 item 25).
  it.each([1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12])('month %i: silver-leaf risk only from September to May', (month) => {
    const date = `2025-${String(month).padStart(2, '0')}-15`;
    const isRiskMonth = month >= 9 || month <= 5;
    for (const type of STONE) {
      const result = check(type, date);
      expect(codes(result).includes('PR-2'), `${type} ${date}`).toBe(isRiskMonth);
      // Sweet cherries wait for their own window from late July (PR-5).
      const isBeforeSweetCherryWindow = type === 'cherry-sweet' && month < 8;
      expect(result.verdict === 'ok', `${type} ${date}`).toBe(!isRiskMonth && !isBeforeSweetCherryWindow);
    }
  });

  // prune(prunus, DORMANT) → block: RHS "Acid cherries" (S3), RHS "Apricots" (S18), Which? "How do I prune peaches and nectarines?" (S26); item 27.
  it.each(STONE)('%s: a cut while dormant is avoided', (type) => {
    for (const date of ['2024-11-05', '2024-12-20', '2025-01-15', '2025-02-28', '2025-03-10']) {
      const result = check(type, date);
      expect(result.verdict, date).toBe('avoid');
      expect(codes(result)).toContain('PR-1');
    }
  });

  it('sweet cherry, established: late July to 31 August; earlier summer is a caution (RHS via UK press, S21; item 28)', () => {
    expect(check('cherry-sweet', '2025-07-21').verdict).toBe('ok');
    expect(check('cherry-sweet', '2025-08-31').verdict).toBe('ok');
    const early = check('cherry-sweet', '2025-07-05');
    expect(early.verdict).toBe('caution');
    expect(early.nextSafe).toEqual({ from: '2025-07-21', to: '2025-08-31' });
    const late = check('cherry-sweet', '2025-09-01');
    expect(late.verdict).toBe('caution');
    expect(codes(late)).toEqual(expect.arrayContaining(['PR-2', 'PR-10'])); // RHS fan-trained trees (S7): finish by late August
  });

  it('plum, established: summer is ok, with the July head-thinning and pyramid timing noted (RHS, "Plums: pruning", S4; item 29)', () => {
    const july = check('plum', '2025-07-17');
    expect(july.verdict).toBe('ok');
    expect(codes(july)).toEqual(['PR-3', 'PR-7', 'PR-12']);
    expect(messageOf(july, 'PR-7')).toContain('third week of July');
  });

  it('young trees are shaped at bud burst in spring, established ones are not (PR-4: RHS S4, S18, S21, S3)', () => {
    for (const type of STONE) {
      expect(check(type, '2025-04-10', { ageYears: 1 }).verdict, type).toBe('ok');
      expect(check(type, '2025-04-10').verdict, type).toBe('caution');
    }
    expect(check('apricot', '2025-04-10', { ageYears: 2 }).rules[0]?.source).toContain('[S18]');
    expect(check('plum', '2025-01-10', { ageYears: 1 }).verdict).toBe('avoid'); // still not in winter
  });

  it('peach: summer ok, spring a caution with a note, winter avoided (Which? S26; RHS S1)', () => {
    expect(check('peach', '2025-07-15').verdict).toBe('ok');
    const spring = check('peach', '2025-04-15');
    expect(spring.verdict).toBe('caution');
    expect(codes(spring)).toEqual(expect.arrayContaining(['PR-2', 'PR-8']));
    expect(check('peach', '2025-01-15').verdict).toBe('avoid');
  });

  it('apricot: established in summer (RHS, "Apricots", S18)', () => {
    expect(check('apricot', '2025-07-01').verdict).toBe('ok');
    expect(codes(check('apricot', '2025-07-01'))).toContain('PR-9');
  });

  it('suggests a leaf-curl rain shelter on peaches from November to mid-May (RHS, "Peach leaf curl", S9; item 31)', () => {
    expect(codes(check('peach', '2025-12-01'))).toContain('PR-18');
    expect(codes(check('nectarine', '2025-05-15'))).toContain('PR-18');
    expect(codes(check('peach', '2025-05-16'))).not.toContain('PR-18');
    expect(codes(check('plum', '2025-12-01'))).not.toContain('PR-18');
  });
});

describe('northern-US profile', () => {
  const us = { profile: 'us-north' } as const;

  it('peach: no pruning January to March; best just before bloom to two weeks after petal fall (Penn State, "Fruit production for the home gardener", 2016, S54; item 53)', () => {
    const feb = check('peach', '2025-02-15', us);
    expect(feb.verdict).toBe('avoid');
    expect(codes(feb)).toContain('US-1');
    expect(check('peach', '2025-03-20', us).verdict).toBe('avoid'); // past dormancy but still March
    const april = check('peach', '2025-04-25', us);
    expect(april.verdict).toBe('ok');
    expect(april.rules[0]?.source).toContain('[S54]');
    expect(feb.nextSafe).toEqual({ from: '2025-04-01', to: '2025-05-15' });
  });

  it('sweet cherry: not dormant, pruned after harvest from early July (Penn State S54; Rutgers S55; UMass S56)', () => {
    expect(check('cherry-sweet', '2025-07-05', us).verdict).toBe('ok');
    expect(check('cherry-sweet', '2025-01-15', us).verdict).toBe('avoid');
    expect(codes(check('cherry-sweet', '2025-07-05', us))).toContain('US-2');
  });

  it('plum, tart cherry and apricot may be pruned as late as delayed-dormant to early bloom (Rutgers NJAES, S55)', () => {
    for (const type of ['plum', 'cherry-sour', 'apricot'] as const) {
      const result = check(type, '2025-04-01', us);
      expect(result.verdict, type).toBe('ok');
      expect(codes(result)).toContain('US-3');
      expect(check(type, '2025-04-01').verdict, `${type} in the UK`).toBe('caution');
    }
  });
});

describe('weather and symptoms', () => {
  it('a wet day turns ok into caution, and the safe window starts tomorrow (RHS fan-trained trees, S7)', () => {
    const result = check('plum', '2025-07-10', { wet: true });
    expect(result.verdict).toBe('caution');
    expect(codes(result)).toContain('PR-11');
    expect(result.nextSafe).toEqual({ from: '2025-07-11', to: '2025-08-31' });
  });

  it('silver leaf: cut it out in summer, 10–15 cm beyond the stain (RHS, "Silver leaf", S1; item 26)', () => {
    const summer = check('plum', '2025-07-01', { symptoms: ['silver-leaf'] });
    expect(summer.verdict).toBe('ok');
    expect(messageOf(summer, 'PR-13')).toContain('10–15 cm beyond the end of the dark stain');
    expect(codes(summer)).toEqual(expect.arrayContaining(['PR-14', 'PR-15']));
    const winter = check('plum', '2025-01-15', { symptoms: ['silver-leaf'] });
    expect(winter.verdict).toBe('avoid');
    expect(winter.nextSafe).toEqual({ from: '2025-06-01', to: '2025-08-31' });
  });

  it('canker: remedial cuts in summer even before the sweet-cherry window, with tools disinfected (RHS bacterial canker S2; common practice)', () => {
    const result = check('cherry-sweet', '2025-07-01', { symptoms: ['canker'] });
    expect(result.verdict).toBe('ok');
    expect(messageOf(result, 'PR-16')).toMatch(/disinfecting tools/);
    expect(check('cherry-sweet', '2025-10-01', { symptoms: ['canker'] }).verdict).toBe('caution');
  });

  it('apricot canker cuts are painted; otherwise no wound paint (RHS "Apricots" S18; RHS "Silver leaf" S1)', () => {
    const apricot = check('apricot', '2025-07-01', { symptoms: ['canker'] });
    expect(messageOf(apricot, 'PR-16')).toContain('paint the cut');
    expect(codes(apricot)).not.toContain('PR-12');
    expect(codes(check('plum', '2025-07-01'))).toContain('PR-12');
  });

  it('dead wood: stubs may come off any time, but the verdict for a cut stands', () => {
    const result = check('plum', '2025-01-15', { symptoms: ['dead-wood'] });
    expect(result.verdict).toBe('avoid');
    expect(codes(result)).toContain('PR-17');
  });
});

describe('southern hemisphere: the same rules six months on', () => {
  const south = { latitude: -37.8 };

  it('January in the south is July in the north', () => {
    expect(check('plum', '2025-01-15', south).verdict).toBe('ok');
    expect(check('plum', '2025-07-15', south).verdict).toBe('avoid');
    expect(check('cherry-sweet', '2026-01-25', south).verdict).toBe('ok');
    expect(check('cherry-sweet', '2026-01-05', south).verdict).toBe('caution');
  });

  it('finds the next safe window in the southern summer and names southern months', () => {
    const result = check('plum', '2025-07-15', south);
    expect(result.nextSafe).toEqual({ from: '2025-12-01', to: '2026-02-28' });
    expect(messageOf(result, 'PR-2')).toBe('Silver leaf spores are about from March to November.');
  });
});

describe('invariants and bad input', () => {
  it('the verdict is the worst rule, and the next safe day is safe', () => {
    const severity = { note: 0, ok: 0, caution: 1, avoid: 2 } as const;
    fc.assert(
      fc.property(
        fc.constantFrom(...STONE), fc.integer({ min: 0, max: 729 }), fc.integer({ min: 0, max: 20 }), fc.boolean(),
        fc.subarray(['silver-leaf', 'canker', 'dead-wood'] as const), fc.constantFrom('uk', 'us-north' as const), fc.constantFrom(52, -37),
        (type, offset, ageYears, wet, symptoms, profile, latitude) => {
          const date = addDays('2025-01-01', offset);
          const input = { type, date, latitude, ageYears, wet, symptoms, profile };
          const result = checkStoneFruitCut(input);
          const top = Math.max(...result.rules.map((r) => severity[r.effect]));
          const expected = top === 2 ? 'avoid' : top === 1 ? 'caution' : 'ok';
          if (result.verdict !== expected || !result.nextSafe) return false;
          const first = checkStoneFruitCut({ ...input, date: result.nextSafe.from, wet: false });
          return result.nextSafe.from >= date && result.nextSafe.from <= result.nextSafe.to && first.verdict === 'ok';
        },
      ),
      { numRuns: 300 },
    );
  });

  it('rejects a date that does not exist, an unknown type and a negative age', () => {
    expect(() => check('plum', '2025-02-30')).toThrow(CareInputError);
    expect(() => check('banana' as PlantTypeCode, '2025-07-01')).toThrow(CareInputError);
    expect(() => check('plum', '2025-07-01', { ageYears: -1 })).toThrow(CareInputError);
  });
});
