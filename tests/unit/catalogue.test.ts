import { describe, expect, it } from 'vitest';
import { plantGroups, plantTypeCodes, type PlantTypeCode } from '../../server/schemas/catalogue';
import {
  catalogue, catalogueBases, degreeDayTriggers, formMatches, taskCodes, taskLabels,
  type TaskCode, type TaskRule,
} from '../../server/care/catalogue';
import { COMMON_PRACTICE, FROM_MEMORY, cite, describeSource, isSourceKey, sources } from '../../server/care/sources';
import { calendarDate, siteSeason, triggerOutcome } from '../../server/care/windows';
import { daysBetween } from '../../server/care/dates';
import { degreeDaysToCelsius, fahrenheitToCelsius } from '../../server/care/degree-days';

function ruleOf(type: PlantTypeCode, key: string): TaskRule {
  const rule = catalogue[type].rules.find((r) => r.key === key);
  if (!rule) throw new Error(`${type} has no rule ${key}`);
  return rule;
}

function detailOf(type: PlantTypeCode, key: string): string {
  return ruleOf(type, key).detail ?? '';
}

const isLabel = (label: string): boolean => isSourceKey(label) || label === COMMON_PRACTICE || label === FROM_MEMORY;

describe('catalogue — every type', () => {
  it.each(plantTypeCodes)('%s has a group, a base temperature, a chill need and sourced rules', (code) => {
    const profile = catalogue[code];
    expect(profile.code).toBe(code);
    expect(plantGroups).toContain(profile.group);
    expect(Number.isFinite(profile.degreeDayBase.celsius)).toBe(true);
    expect(profile.degreeDayBase.source.length).toBeGreaterThan(0);
    expect(profile.chill.length).toBeGreaterThan(0);
    for (const chill of profile.chill) {
      expect(chill.min).toBeLessThanOrEqual(chill.max);
      expect(chill.source.every(isLabel)).toBe(true);
    }
    expect(profile.rules.length).toBeGreaterThan(0);
    for (const rule of profile.rules) {
      expect(rule.source.length, rule.key).toBeGreaterThan(0);
      expect(rule.source.every(isLabel), rule.key).toBe(true);
      expect(cite(rule.source).length, rule.key).toBeGreaterThan(0);
      expect(rule.reason.trim().length, rule.key).toBeGreaterThan(0);
    }
  });

  it.each(plantTypeCodes)('%s has unique rule keys and real calendar bounds', (code) => {
    const keys = catalogue[code].rules.map((r) => r.key);
    expect(new Set(keys).size).toBe(keys.length);
    for (const rule of catalogue[code].rules) {
      for (const bound of [rule.opens, rule.closes]) {
        if (bound.kind !== 'date') continue;
        expect(bound.month).toBeGreaterThanOrEqual(1);
        expect(bound.month).toBeLessThanOrEqual(12);
        expect(bound.day).toBeGreaterThanOrEqual(1);
        expect(bound.day).toBeLessThanOrEqual(31);
      }
    }
  });

  it('puts each type in the group DESIGN.md §5 names', () => {
    const byGroup = (group: string) => plantTypeCodes.filter((c) => catalogue[c].group === group);
    expect(byGroup('pome')).toEqual(['apple', 'pear', 'quince', 'medlar']);
    expect(byGroup('stone')).toEqual(['plum', 'gage', 'damson', 'cherry-sweet', 'cherry-sour', 'peach', 'nectarine', 'apricot']);
    expect(byGroup('fig')).toEqual(['fig']);
    expect(byGroup('vine')).toEqual(['grape', 'grape-under-cover']);
    expect(byGroup('bush').sort()).toEqual(['blackcurrant', 'blueberry', 'gooseberry', 'redcurrant', 'whitecurrant']);
    expect(byGroup('cane').sort()).toEqual(['blackberry', 'hybrid-berry', 'raspberry-autumn', 'raspberry-summer']);
  });

  it('uses every task code somewhere and labels each one', () => {
    const used = new Set<TaskCode>(plantTypeCodes.flatMap((c) => catalogue[c].rules.map((r) => r.task)));
    expect([...used].sort()).toEqual([...taskCodes].sort());
    for (const code of taskCodes) expect(taskLabels[code].length).toBeGreaterThan(0);
  });

  it('never schedules winter pruning for stone fruit', () => {
    // RHS, "Acid cherries" (S3); RHS, "Apricots" (S18); Which? Gardening, "How do I prune peaches and nectarines?" (S26).
    for (const code of plantTypeCodes.filter((c) => catalogue[c].group === 'stone')) {
      expect(catalogue[code].rules.some((r) => r.task === 'winter-prune')).toBe(false);
    }
  });
});

describe('catalogue — base temperatures and chill', () => {
  it('takes the published bases', () => {
    expect(catalogue.apple.degreeDayBase).toEqual({ celsius: 5, source: ['S50'] }); // OMAFRA ONfruit, "The March of Spring – 2021 update"
    expect(catalogue['cherry-sweet'].degreeDayBase).toEqual({ celsius: 2, source: ['S51'] }); // Meland et al. 2017, Acta Hortic. 1162
    expect(catalogue['cherry-sour'].degreeDayBase).toEqual({ celsius: 4, source: ['S52'] }); // Zavalloni et al. 2006, JASHS 131
    expect(catalogue.grape.degreeDayBase).toEqual({ celsius: 10, source: ['S32'] }); // Amerine & Winkler 1944, Hilgardia 15
  });

  it('lists every base a window needs, the green-tip 6.1 °C included', () => {
    expect(catalogueBases).toEqual([2, 4, 5, 6.1, 10]);
  });

  it('gives the published chill portions (UC FNRIC chill portions compilation, item 11)', () => {
    expect(catalogue['cherry-sweet'].chill).toContainEqual({ measure: 'chill-portions', min: 30, max: 70, source: ['S40'] });
    expect(catalogue.apple.chill.find((c) => c.measure === 'chill-portions')).toMatchObject({ min: 50, max: 50, source: ['S40'] });
  });

  it('gives the blackcurrant chill need in hours below 7 °C (The Times 2018 on James Hutton Institute work, item 14)', () => {
    expect(catalogue.blackcurrant.chill[0]).toMatchObject({ measure: 'hours-below-7c', min: 1800 });
    expect(catalogue.blackcurrant.chill[0]?.source).toContain('S67');
  });
});

describe('catalogue — degree-day triggers', () => {
  it('converts the UMass green-tip rule: 120 °F·days base 43 °F from 1 March (UMass Extension, "Predicting green tip?", 2019, item 55)', () => {
    const greenTip = degreeDayTriggers.find((t) => t.id === 'apple-green-tip');
    expect(greenTip?.degreeDays).toBe(Math.round(degreeDaysToCelsius(120)));
    expect(greenTip?.base).toBeCloseTo(fahrenheitToCelsius(43), 1);
    expect(greenTip?.from).toEqual({ month: 3, day: 1 });
    expect(greenTip?.source).toEqual(['S49']);
  });

  it('labels every derived total as unverified', () => {
    for (const trigger of degreeDayTriggers.filter((t) => t.calibratedTo)) expect(trigger.source).toContain(FROM_MEMORY);
  });

  it.each(degreeDayTriggers.filter((t) => t.calibratedTo).map((t) => [t.id, t] as const))(
    '%s is reached within three days of the published date under the default normals',
    (_id, trigger) => {
      for (const season of [2023, 2024, 2025]) {
        const ss = siteSeason({ latitude: 51.5, longitude: -0.1 }, season);
        const outcome = triggerOutcome(ss, trigger.id);
        const target = calendarDate({ ...(trigger.calibratedTo ?? { month: 1, day: 1 }), yearOffset: 0 }, season, 'north');
        expect(outcome?.reachedOn).toBeDefined();
        expect(Math.abs(daysBetween(target, outcome?.reachedOn ?? '1900-01-01'))).toBeLessThanOrEqual(3);
      }
    },
  );
});

describe('catalogue — feed rates in g/m² (care-rules.md §9 items 36–44)', () => {
  it('apples: 100 g/m² bare soil, 140 in grass, cooking apples ×1.5, potash 25 g/m² every third year (RHS, "Fruit trees: feeding and mulching", items 36–37)', () => {
    const detail = detailOf('apple', 'spring-feed');
    for (const rate of ['100 g/m²', '140 g/m²', '150 and 210 g/m²', '25 g/m²']) expect(detail).toContain(rate);
    expect(ruleOf('apple', 'spring-feed').source).toEqual(['S5']);
  });

  it.each(['pear', 'plum', 'gage', 'damson', 'cherry-sweet', 'cherry-sour', 'peach', 'nectarine'] as const)(
    'established %s: 140 g/m² in early spring (RHS, "Fruit trees: feeding and mulching", item 38)',
    (code) => {
      expect(detailOf(code, 'spring-feed')).toContain('140 g/m²');
      expect(ruleOf(code, 'spring-feed').source).toContain('S5');
    },
  );

  it.each(['redcurrant', 'whitecurrant', 'gooseberry'] as const)('%s: sulphate of potash 15 g/m² each late winter (RHS, "Gooseberries, red and white currants", item 39)', (code) => {
    expect(detailOf(code, 'spring-feed')).toMatch(/15 g\/m² of sulphate of potash/);
    expect(detailOf(code, 'spring-feed')).toContain('60 g/m²');
    expect(ruleOf(code, 'spring-feed').source).toEqual(['S11']);
  });

  it('raspberries: 30 g/m² in early March; weak growth 30 g/m² sulphate of ammonia or 90 g/m² pellets (RHS, "Raspberries", item 40)', () => {
    const rule = ruleOf('raspberry-summer', 'spring-feed');
    expect(rule.opens).toMatchObject({ month: 3, day: 1 });
    expect(rule.detail).toMatch(/30 g\/m² of a general fertiliser/);
    expect(rule.detail).toMatch(/30 g\/m² of sulphate of ammonia or 90 g\/m²/);
    expect(rule.source).toEqual(['S13']);
  });

  it('outdoor grapes: 70 g/m² in February, potash rate unverified (RHS, "Grapes: outdoor cultivation", item 41)', () => {
    const rule = ruleOf('grape', 'spring-feed');
    expect(rule.opens).toMatchObject({ month: 2, day: 1 });
    expect(rule.closes).toMatchObject({ month: 2 });
    expect(rule.detail).toContain('70 g/m²');
    expect(rule.source).toEqual(['S8', FROM_MEMORY]);
  });

  it('blueberries: 15 g/m² sulphate of ammonia in late winter, pH 5.5 or below, container feed monthly April–September (RHS, "Blueberries", item 43)', () => {
    expect(detailOf('blueberry', 'spring-feed')).toContain('15 g/m² of sulphate of ammonia');
    expect(detailOf('blueberry', 'spring-feed')).toContain('pH 5.5');
    const pots = ruleOf('blueberry', 'fruiting-feed');
    expect([pots.opens, pots.closes]).toMatchObject([{ month: 4, day: 1 }, { month: 9, day: 30 }]);
    expect(pots.source).toEqual(['S17']);
  });

  it('figs: high-potash liquid feed weekly once fruits appear; weak trees about 70 g (RHS, "Figs", item 44)', () => {
    expect(ruleOf('fig', 'fruiting-feed').reason).toMatch(/weekly with a high-potash liquid feed once fruits appear/);
    expect(detailOf('fig', 'spring-feed')).toContain('70 g');
    expect(ruleOf('fig', 'fruiting-feed').source).toContain('S15');
  });

  it('apricots: 35 g/m² sulphate of potash late winter, 100 g/m² general fertiliser early spring (RHS, "Apricots")', () => {
    expect(detailOf('apricot', 'spring-feed')).toMatch(/35 g\/m² of sulphate of potash.*100 g\/m² of a general fertiliser/);
  });
});

describe('catalogue — thinning (RHS thinning advice via reproduction, 2013, item 45)', () => {
  it.each([
    ['apple', ['10–15 cm', '15–23 cm']],
    ['pear', ['two fruits', '10–15 cm']],
    ['plum', ['5–8 cm']],
    ['damson', ['5–8 cm']],
    ['peach', ['10 cm', '20–25 cm']],
    ['nectarine', ['15 cm']],
    ['apricot', ['5–8 cm']],
  ] as const)('%s thins to %j', (code, spacings) => {
    const rule = ruleOf(code, 'fruit-thinning');
    for (const spacing of spacings) expect(rule.detail).toContain(spacing);
    expect(rule.source).toContain('S19');
  });

  it('finishes apple thinning by mid-July (Garden Organic, "Apple fruit thinning", item 46)', () => {
    expect(ruleOf('apple', 'fruit-thinning').closes).toMatchObject({ kind: 'date', month: 7, day: 15 });
    expect(ruleOf('apple', 'fruit-thinning').source).toContain('S29');
  });

  it('does not thin cherries', () => {
    expect(catalogue['cherry-sweet'].rules.some((r) => r.task === 'fruit-thinning')).toBe(false);
  });
});

describe('catalogue — vines and canes', () => {
  it('picks vine leaves from mid-May to mid-August, 10–15 cm across (common practice, item 50)', () => {
    for (const code of ['grape', 'grape-under-cover'] as const) {
      const rule = ruleOf(code, 'leaf-picking');
      expect([rule.opens, rule.closes]).toMatchObject([{ month: 5, day: 15 }, { month: 8, day: 15 }]);
      expect(rule.detail).toContain('10–15 cm (4–6 in)');
      expect(rule.detail).toMatch(/darker, dull leaves are tougher/i);
      expect(rule.source).toEqual([COMMON_PRACTICE]);
    }
  });

  it('thins grape bunches by shoot length: under 20 cm none, 20–51 cm one, over 51 cm two (NCAT/ATTRA, "High tunnel grapes: cluster thinning", item 47)', () => {
    expect(detailOf('grape', 'bunch-thinning')).toContain('under 20 cm no bunch, 20–51 cm one, over 51 cm two');
    expect(ruleOf('grape', 'bunch-thinning').source).toContain('S61');
  });

  it('keeps 20–25 fruiting canes on a vigorous blackberry and cuts primocane types in February (RHS, "Blackberry and hybrid berry", item 51)', () => {
    expect(detailOf('blackberry', 'tying-in')).toContain('20–25 fruiting canes');
    expect(detailOf('blackberry', 'cane-cutting-out')).toContain('February');
    expect(ruleOf('raspberry-autumn', 'cane-cutting-out').opens).toMatchObject({ month: 2, day: 1 });
  });
});

describe('catalogue — forms', () => {
  it('tells trained from free-standing forms', () => {
    expect(formMatches('trained', 'espalier')).toBe(true);
    expect(formMatches('trained', 'bush')).toBe(false);
    expect(formMatches('free-standing', 'pyramid')).toBe(true);
    expect(formMatches('free-standing', 'cordon')).toBe(false);
    expect(formMatches(['pyramid'], 'bush')).toBe(false);
    expect(formMatches(undefined, 'stool')).toBe(true);
  });
});

describe('sources', () => {
  it('describes a published source with organisation, title and year', () => {
    expect(describeSource('S19')).toBe('RHS, “How to thin fruit after the June drop”, 2013 [S19]');
    expect(describeSource('S1')).toBe('RHS, “Silver leaf (disease profile)” [S1]');
  });

  it('passes the two labels through unchanged', () => {
    expect(COMMON_PRACTICE).toBe('common practice, no single source');
    expect(FROM_MEMORY).toBe('from memory, unverified');
    expect(cite([COMMON_PRACTICE, 'S5'])).toBe('common practice, no single source; RHS, “Fruit trees: feeding and mulching” [S5]');
  });

  it('gives every source an organisation and a title', () => {
    for (const source of Object.values(sources)) {
      expect(source.organisation.length).toBeGreaterThan(0);
      expect(source.title.length).toBeGreaterThan(0);
    }
  });
});
