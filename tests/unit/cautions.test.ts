import { describe, expect, it } from 'vitest';
import {
  COMMON_PRACTICE,
  cautionsFor,
  heatBand,
  heightBandFor,
  heightBandForWork,
  toolsFor,
  uvProtection,
  waterCups,
  type Caution,
  type CautionInput,
  type CautionTask,
} from '../../server/care/cautions';
import { CareInputError } from '../../server/care/degree-days';

const codes = (input: CautionInput): string[] => cautionsFor(input).map((c) => c.code);
const find = (input: CautionInput, code: string): Caution | undefined => cautionsFor(input).find((c) => c.code === code);

describe('height bands (safety.md §7, G/L/M/H, a design choice there)', () => {
  it('bands the feet height at 0, 1.0 and 3.0 m', () => {
    expect(heightBandFor(0)).toBe('ground');
    expect(heightBandFor(0.5)).toBe('low');
    expect(heightBandFor(1.0)).toBe('low');
    expect(heightBandFor(1.01)).toBe('mid');
    expect(heightBandFor(3.0)).toBe('mid');
    expect(heightBandFor(3.01)).toBe('high');
    expect(() => heightBandFor(-1)).toThrow(CareInputError);
  });

  it('bands a work height with 2 m of reach and a 4.5 m cut-point limit', () => {
    expect(heightBandForWork(1.8)).toBe('ground');
    expect(heightBandForWork(3.0)).toBe('low');
    expect(heightBandForWork(4.5)).toBe('mid');
    expect(heightBandForWork(4.6)).toBe('high');
  });
});

describe('toolsFor', () => {
  it('gives hand tools on the ground and adds a ladder off it', () => {
    expect(toolsFor('prune')).toEqual(['secateurs', 'loppers', 'pruning-saw', 'sanitiser']);
    expect(toolsFor('prune', 0.8)).toEqual(['ladder', 'secateurs', 'loppers', 'pruning-saw', 'sanitiser']);
    expect(toolsFor('harvest', 2)).toEqual(['ladder']);
  });

  it('drops loppers in the middle band, where one hand is on the ladder', () => {
    // safety.md §7.7 R-LP2, HSE INDG402 (2005) three points of contact
    expect(toolsFor('prune', 2)).not.toContain('loppers');
    expect(toolsFor('prune', 2)).toContain('ladder');
  });

  it('keeps spraying, feeding and mulching on the ground', () => {
    expect(toolsFor('spray', 2.5)).toEqual(['sprayer']);
    expect(toolsFor('feed', 2)).toEqual(['granular-feed', 'liquid-feed']);
    expect(toolsFor('mulch', 2)).toEqual([]);
  });
});

describe('cautionsFor — power lines', () => {
  it('adds the power-line cautions only when overhead lines are flagged', () => {
    // safety.md §7.12 (HSE GS6; ENA Look Out, Look Up!; PG&E orchard worker safety program)
    const without = codes({ task: 'prune', heightM: 2 });
    expect(without.filter((c) => c.startsWith('R-PL'))).toEqual([]);
    const withLines = codes({ task: 'prune', heightM: 2, hazards: ['overhead-lines'] });
    expect(withLines).toEqual(expect.arrayContaining(['R-PL1', 'R-PL2', 'R-PL3', 'R-PL4', 'R-PL5', 'R-PL6']));
  });

  it('defers line work to the network operator and a line-clearance arborist', () => {
    const defer = find({ task: 'harvest', heightM: 0, hazards: ['overhead-lines'] }, 'R-PL4');
    expect(defer?.severity).toBe('stop');
    expect(defer?.text).toMatch(/electricity network operator/);
    expect(defer?.text).toMatch(/qualified line-clearance arborist/);
  });

  it('gives the US distance in the US and the UK two-branch-lengths rule in the UK', () => {
    // US OSHA 29 CFR 1910.333(c)(3) 10 ft; ENA Look Out, Look Up! two branch lengths
    const us = codes({ task: 'prune', hazards: ['overhead-lines'], country: 'US' });
    expect(us).toContain('R-PL2');
    expect(us).not.toContain('R-PL3');
    const uk = codes({ task: 'prune', hazards: ['overhead-lines'], country: 'UK' });
    expect(uk).toContain('R-PL3');
    expect(uk).not.toContain('R-PL2');
    expect(find({ task: 'prune', hazards: ['overhead-lines'], country: 'US' }, 'R-PL2')?.text).toMatch(/10 ft \(3 m\)/);
  });
});

describe('cautionsFor — chainsaws and pole saws', () => {
  it('stops chainsaw work off the ground and sends it to an arborist', () => {
    // HSE AFAG401 (2009); chainsaw makers' instructions; safety.md §8 T30 (band M → not allowed)
    const mid = cautionsFor({ task: 'prune', tools: ['chainsaw'], heightM: 2 });
    expect(mid[0]).toMatchObject({ code: 'R-CS5', severity: 'stop' });
    expect(mid[0]?.text).toMatch(/arborist|tree surgeon/);
    expect(mid.map((c) => c.code)).not.toContain('R-CS1');
  });

  it('gives training, kit and company cautions for a chainsaw on the ground', () => {
    // HSE INDG317 (2013) Chainsaws at work
    const ground = codes({ task: 'prune', tools: ['chainsaw'], heightM: 0 });
    expect(ground).toEqual(expect.arrayContaining(['R-CS1', 'R-CS2', 'R-CS3', 'R-CS4', 'R-PS3', 'R-G2']));
    expect(ground).not.toContain('R-CS5');
  });

  it('stops a pole saw used from a ladder', () => {
    expect(find({ task: 'prune', tools: ['pole-saw', 'ladder'], heightM: 1.5 }, 'R-PP5')?.severity).toBe('stop');
    const ground = codes({ task: 'prune', tools: ['pole-saw'], heightM: 0 });
    expect(ground).toEqual(expect.arrayContaining(['R-PP1', 'R-PP2', 'R-PP3', 'R-PP4']));
    expect(ground).not.toContain('R-PP5');
  });
});

describe('cautionsFor — height, ladders and the ground', () => {
  it('defers high work to a qualified arborist and the network operator', () => {
    // safety.md §6.1 and §7.16 R-AR1 (threshold a design choice)
    const high = cautionsFor({ task: 'prune', heightM: 3.5 });
    expect(high[0]).toMatchObject({ code: 'R-AR1', severity: 'stop' });
    expect(high[0]?.text).toMatch(/qualified arborist/);
    expect(high[0]?.text).toMatch(/electricity network operator/);
    expect(codes({ task: 'prune', heightM: 2 })).not.toContain('R-AR1');
  });

  it('gives the ladder set in the middle band and none on the ground', () => {
    // HSE INDG455 (2014) and INDG402 (2005): 1 in 4, top rungs, three points of contact, short light work
    const mid = codes({ task: 'prune', heightM: 2 });
    expect(mid).toEqual(expect.arrayContaining(['R-L1', 'R-L2', 'R-L3', 'R-L4', 'R-LL1', 'R-LL2', 'R-LL3', 'R-LL4', 'R-G1', 'R-G3']));
    const ground = codes({ task: 'prune', heightM: 0 });
    expect(ground.filter((c) => /^R-(L|LL)\d/.test(c))).toEqual([]);
  });

  it('warns about loppers only where a ladder needs a hand', () => {
    expect(codes({ task: 'prune', tools: ['loppers', 'ladder'], heightM: 2 })).toContain('R-LP2');
    expect(codes({ task: 'prune', tools: ['loppers'], heightM: 0 })).toEqual(expect.arrayContaining(['R-LP1']));
    expect(codes({ task: 'prune', tools: ['loppers'], heightM: 0 })).not.toContain('R-LP2');
  });

  it('adds footing cautions on soft or sloping ground when off the ground', () => {
    // WSPS Orchard Ladder Safety (tripod on soft ground); tripod maker's instructions in Hobby Farms 2022 (slopes)
    expect(codes({ task: 'harvest', heightM: 2, hazards: ['soft-ground'] })).toContain('R-SL3');
    expect(codes({ task: 'harvest', heightM: 2, hazards: ['sloping-ground'] })).toContain('R-TL2');
    expect(codes({ task: 'harvest', heightM: 0, hazards: ['sloping-ground'] })).not.toContain('R-TL2');
  });

  it('gives picking cautions for harvest from a ladder', () => {
    // US OSHA tripod orchard ladder QuickCard; HSE INDG403 10 kg
    expect(codes({ task: 'harvest', heightM: 2 })).toEqual(expect.arrayContaining(['R-PK1', 'R-PK2', 'R-PK3', 'R-L6']));
  });

  it('assumes the middle band for a ladder with no height given', () => {
    expect(codes({ task: 'thin', tools: ['ladder', 'secateurs'] })).toEqual(expect.arrayContaining(['R-L1', 'R-LL2', 'R-SC2', 'R-TH1']));
  });

  it('writes the 1-in-4 example in feet for the US', () => {
    expect(find({ task: 'prune', heightM: 2, country: 'US' }, 'R-LL1')?.text).toMatch(/12 ft/);
    expect(find({ task: 'prune', heightM: 2, country: 'UK' }, 'R-LL1')?.text).toMatch(/0\.75 m/);
  });
});

describe('cautionsFor — plants, chemicals, season and weather', () => {
  it('warns about fig sap when pruning figs', () => {
    // Redgrave & Solomon 2021, BMJ Case Reports, fig sap phytophotodermatitis
    expect(find({ task: 'prune', plantType: 'fig' }, 'R-HS4')?.severity).toBe('warn');
    expect(codes({ task: 'prune', plantType: 'apple' })).not.toContain('R-HS4');
    expect(codes({ task: 'feed', plantType: 'fig' })).not.toContain('R-HS4');
  });

  it('gives label cautions for spraying, and stops spraying from a ladder', () => {
    // US EPA Read the Label First!; HSE CRD garden pesticides pages
    const ground = codes({ task: 'spray' });
    expect(ground).toEqual(expect.arrayContaining(['R-SP1', 'R-SP2', 'R-SP3', 'R-SP4', 'R-SP5', 'R-SP6']));
    expect(ground).not.toContain('R-SP7');
    expect(codes({ task: 'spray', heightM: 2 })).toContain('R-SP7');
  });

  it('gives feed and manure cautions for feeding and mulching', () => {
    // USDA NOP 7 CFR 205.203(c)(1) for raw manure; US FDA 2001 on comfrey
    expect(codes({ task: 'feed' })).toEqual(expect.arrayContaining(['R-FD1', 'R-FD2', 'R-LM1', 'R-LM2', 'R-LM3', 'R-LM4']));
    expect(codes({ task: 'mulch' })).toEqual(expect.arrayContaining(['R-FD1', 'R-LM4']));
    expect(codes({ task: 'mulch' })).not.toContain('R-G6');
  });

  it('gives the disinfecting cautions when pruning', () => {
    // University of Arizona Cooperative Extension 2018; University of Minnesota Extension 2015
    expect(codes({ task: 'prune' })).toEqual(expect.arrayContaining(['R-DS1', 'R-DS2', 'R-DS3']));
  });

  it('warns about nesting birds when cutting in the UK from March to August', () => {
    // Wildlife and Countryside Act 1981 s.1; RSPB guidance
    expect(codes({ task: 'prune', country: 'UK', month: 5 })).toContain('R-LG3');
    expect(codes({ task: 'prune', country: 'UK', month: 11 })).not.toContain('R-LG3');
    expect(codes({ task: 'feed', country: 'UK', month: 5 })).not.toContain('R-LG3');
    expect(() => cautionsFor({ task: 'prune', month: 13 })).toThrow(CareInputError);
  });

  it('sends work over roads, paths and roofs to a professional', () => {
    expect(codes({ task: 'prune', hazards: ['road-or-path'] })).toContain('R-AR2');
    expect(codes({ task: 'prune', hazards: ['greenhouse-or-roof'] })).toContain('R-AR2');
    expect(codes({ task: 'prune' })).not.toContain('R-AR2');
  });

  it('adds heat and UV cautions from the forecast', () => {
    // US OSHA Heat: Water. Rest. Shade.; WHO Global Solar UV Index guide (2002)
    expect(codes({ task: 'harvest', heatIndexF: 88 })).not.toContain('R-HS2');
    expect(codes({ task: 'harvest', heatIndexF: 95 })).toContain('R-HS2');
    expect(codes({ task: 'harvest', heightM: 2, heatIndexF: 104 })).toEqual(expect.arrayContaining(['R-HS2', 'R-HS3', 'R-HS5']));
    expect(find({ task: 'harvest', uvIndex: 9 }, 'R-HS1')?.text).toMatch(/very high/);
    expect(codes({ task: 'harvest', uvIndex: 2 })).not.toContain('R-HS1');
  });
});

describe('cautionsFor — every caution', () => {
  const tasks: CautionTask[] = ['prune', 'thin', 'feed', 'spray', 'harvest', 'tie-in', 'mulch', 'pick-leaves', 'pinch'];
  const all = tasks.flatMap((task) =>
    [0, 0.8, 2, 4].flatMap((heightM) =>
      cautionsFor({ task, heightM, hazards: ['overhead-lines', 'soft-ground', 'sloping-ground', 'road-or-path'], country: 'UK', month: 5, plantType: 'fig', heatIndexF: 110, uvIndex: 9 }),
    ),
  );

  it('comes most serious first', () => {
    const list = cautionsFor({ task: 'prune', tools: ['chainsaw', 'secateurs'], heightM: 2, hazards: ['overhead-lines'] });
    const rank = { stop: 0, warn: 1, info: 2 };
    for (let i = 1; i < list.length; i++) expect(rank[list[i]!.severity]).toBeGreaterThanOrEqual(rank[list[i - 1]!.severity]);
    expect(list.at(-1)?.severity).toBe('info');
  });

  it('carries a reference code, a named source and short text that promises nothing', () => {
    expect(all.length).toBeGreaterThan(100);
    for (const caution of all) {
      expect(caution.code).toMatch(/^R-[A-Z]{1,2}\d$/);
      expect(caution.source.length).toBeGreaterThan(5);
      expect(caution.text.length).toBeLessThanOrEqual(170);
      expect(caution.text).not.toMatch(/\b(safe|safely|guarantee[sd]?|always fine)\b/i);
    }
  });

  it('names the organisation and document, or says it is common practice', () => {
    expect(find({ task: 'prune', tools: ['chainsaw'], heightM: 2 }, 'R-CS5')?.source).toMatch(/HSE, Tree-climbing operations \(AFAG401/);
    expect(find({ task: 'prune', heightM: 2 }, 'R-L4')?.source).toMatch(/HSE, .*INDG402/);
    expect(find({ task: 'prune' }, 'R-SC1')?.source).toBe(COMMON_PRACTICE);
  });

  it('never repeats a code in one answer', () => {
    const list = codes({ task: 'prune', tools: ['chainsaw', 'pole-saw', 'ladder', 'loppers'], heightM: 2, hazards: ['overhead-lines'] });
    expect(new Set(list).size).toBe(list.length);
  });
});

describe('heat, UV and water helpers (safety.md §8)', () => {
  it('T23: heat bands, with full sun raising one band near a boundary', () => {
    // US OSHA, Protective measures at each heat-index risk level, safety.md §8 T23
    expect(heatBand(95)).toBe('moderate');
    expect(heatBand(104)).toBe('high');
    expect(heatBand(88, true)).toBe('moderate');
    expect(heatBand(70, true)).toBe('lower');
    expect(heatBand(120)).toBe('very high');
  });

  it('T24: UV protection from index 3, very high from 8', () => {
    // WHO, WMO, UNEP and ICNIRP 2002, Global Solar UV Index: A Practical Guide, safety.md §8 T24
    expect(uvProtection(2)).toEqual({ isNeeded: false, isVeryHigh: false });
    expect(uvProtection(3)).toEqual({ isNeeded: true, isVeryHigh: false });
    expect(uvProtection(8)).toEqual({ isNeeded: true, isVeryHigh: true });
  });

  it('T25: 6 to 8 cups over two hours', () => {
    // US OSHA Heat: Water. Rest. Shade. (a cup every 15–20 minutes), safety.md §8 T25
    expect(waterCups(120)).toEqual({ min: 6, max: 8 });
  });
});
