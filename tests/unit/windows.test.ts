import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { plantForms, plantTypeCodes, type PlantTypeCode } from '../../server/schemas/catalogue';
import {
  calendarDate, degreeDaysBetween, formatDay, seasonWindows, siteSeason, triggerOutcome, windowState, windowsForPlant,
  type PlantInput, type Window,
} from '../../server/care/windows';
import { catalogue } from '../../server/care/catalogue';
import { TEMPERATE_DEFAULT_NORMALS, dailyNormals } from '../../server/care/projection';
import { checkStoneFruitCut } from '../../server/care/stone-fruit-check';
import { CareInputError, type DailyTemperature } from '../../server/care/degree-days';
import { addDays, dateRange, daysBetween } from '../../server/care/dates';
import { COMMON_PRACTICE } from '../../server/care/sources';

const LONDON = { latitude: 51.5, longitude: -0.1 };
const MELBOURNE = { latitude: -37.8, longitude: 145 };

function find(windows: Window[], key: string): Window {
  const w = windows.find((x) => x.key === key);
  if (!w) throw new Error(`no window ${key} in ${windows.map((x) => x.key).join(', ')}`);
  return w;
}

/** Daily readings that follow the default normals, `delta` °C warmer, from `from` to `to`. */
function readingsLikeNormals(from: string, to: string, delta: number): DailyTemperature[] {
  const { tmin, tmax } = dailyNormals(from, to, TEMPERATE_DEFAULT_NORMALS);
  return dateRange(from, to).map((date, i) => ({ date, tmin: (tmin[i] as number) + delta, tmax: (tmax[i] as number) + delta }));
}

/** The same calendar day six months later (a month's end to the other month's end), independent of the engine's helper. */
function sixMonthsOn(date: string): string {
  const [y, m, d] = date.split('-').map(Number) as [number, number, number];
  const month = m + 6 > 12 ? m - 6 : m + 6;
  const year = m + 6 > 12 ? y + 1 : y;
  const last = new Date(Date.UTC(year, month, 0)).getUTCDate();
  const isMonthEnd = d === new Date(Date.UTC(y, m, 0)).getUTCDate();
  return `${year}-${String(month).padStart(2, '0')}-${String(isMonthEnd ? last : Math.min(d, last)).padStart(2, '0')}`;
}

const trainedPear: PlantInput = { typeCode: 'pear', form: 'espalier', plantedYear: 2012 };

describe('window state on a chosen day', () => {
  const opens = '2025-06-01';
  const closes = '2025-08-31';
  it.each([
    ['2025-05-31', 'upcoming'],
    ['2025-06-01', 'open'],
    ['2025-08-24', 'open'],
    ['2025-08-25', 'closing'], // closes − 6: the last seven days
    ['2025-08-31', 'closing'],
    ['2025-09-01', 'passed'],
  ] as const)('on %s the window is %s', (on, state) => {
    expect(windowState(opens, closes, on)).toBe(state);
    const plum = seasonWindows({ plant: { typeCode: 'plum', form: 'bush', plantedYear: 2010 }, site: LONDON, season: 2025, on });
    expect(find(plum, 'stone-fruit-prune').state).toBe(state);
  });

  it('defaults to the season’s first day rather than reading the clock', () => {
    const windows = seasonWindows({ plant: trainedPear, site: LONDON, season: 2025 });
    expect(find(windows, 'summer-prune').state).toBe('upcoming');
    expect(find(windows, 'winter-prune-trained').state).toBe('open'); // 1 Nov 2024 – 10 Mar 2025
    const south = seasonWindows({ plant: trainedPear, site: MELBOURNE, season: 2025 });
    expect(find(south, 'spring-feed').state).toBe('upcoming'); // 15 Aug – 30 Sep, seen from 1 July
  });
});

describe('calendar windows (UK timings; RHS and Which? sources named per case)', () => {
  const windows = (typeCode: PlantTypeCode, form: PlantInput['form'], extra: Partial<PlantInput> = {}) =>
    seasonWindows({ plant: { typeCode, form, plantedYear: 2010, ...extra }, site: LONDON, season: 2025, on: '2025-01-01' });

  it('prunes established sweet cherries from late July to 31 August (RHS via UK press, S21; item 28)', () => {
    const w = find(windows('cherry-sweet', 'fan'), 'stone-fruit-prune');
    expect([w.opens, w.closes, w.basis]).toEqual(['2025-07-21', '2025-08-31', 'calendar']);
    expect(w.source).toContain('[S21]');
  });

  it('shortens pyramid plum shoots in the third week of July: leaders to 20 cm, side shoots to 15 cm (RHS, "Plums: pruning", S4; item 29)', () => {
    const w = find(windows('plum', 'pyramid'), 'stone-fruit-prune-pyramid');
    expect([w.opens, w.closes]).toEqual(['2025-07-15', '2025-07-21']);
    expect(w.detail).toMatch(/leaders to about 20 cm, side shoots to about 15 cm/);
    expect(() => find(windows('plum', 'bush'), 'stone-fruit-prune-pyramid')).toThrow();
  });

  it('prunes acid cherries in August after picking (RHS, "Acid cherries", S3; item 30)', () => {
    const w = find(windows('cherry-sour', 'bush'), 'stone-fruit-prune');
    expect([w.opens, w.closes]).toEqual(['2025-08-01', '2025-08-31']);
    expect(w.detail).toContain('one in four');
  });

  it('prunes red and white currants in winter and their side shoots to five leaves from mid-June (Which? Gardening, S24; item 35)', () => {
    const list = windows('redcurrant', 'bush');
    expect([find(list, 'winter-prune').opens, find(list, 'winter-prune').closes]).toEqual(['2024-11-01', '2025-02-28']);
    expect([find(list, 'summer-prune').opens, find(list, 'summer-prune').closes]).toEqual(['2025-06-15', '2025-07-31']);
  });

  it('picks vine leaves from mid-May to mid-August, as common practice (item 50)', () => {
    const w = find(windows('grape', 'vine-guyot'), 'leaf-picking');
    expect([w.opens, w.closes, w.basis, w.source]).toEqual(['2025-05-15', '2025-08-15', 'calendar', COMMON_PRACTICE]);
    expect(w.detail).toContain('10–15 cm (4–6 in)');
  });

  it('puts the dormant pruning of a season in the autumn before it', () => {
    const vine = find(windows('grape-under-cover', 'vine-rod-and-spur'), 'winter-prune');
    expect([vine.opens, vine.closes]).toEqual(['2024-11-20', '2024-12-31']);
  });

  it('carries published feed rates in the detail (RHS, "Fruit trees: feeding and mulching", S5; item 38)', () => {
    expect(find(windows('plum', 'bush'), 'spring-feed').detail).toContain('140 g/m²');
  });
});

describe('conditions on form, age and health', () => {
  const at = (plant: PlantInput) => seasonWindows({ plant, site: LONDON, season: 2025, on: '2025-06-01' }).map((w) => w.key);

  it('summer-prunes trained pears but winter-prunes free-standing ones (RHS, "Summer pruning fruit trees", S6; RHS winter pruning, S20)', () => {
    expect(at(trainedPear)).toContain('summer-prune');
    expect(at(trainedPear)).not.toContain('winter-prune');
    expect(at({ typeCode: 'pear', form: 'standard', plantedYear: 2012 })).toContain('winter-prune');
    expect(at({ typeCode: 'pear', form: 'standard', plantedYear: 2012 })).not.toContain('summer-prune');
  });

  it('shapes a young tree and prunes an established one', () => {
    const young = at({ typeCode: 'apple', form: 'bush', plantedYear: 2024 });
    expect(young).toContain('formative-prune');
    expect(young).not.toContain('winter-prune');
    const old = at({ typeCode: 'apple', form: 'bush', plantedYear: 2015 });
    expect(old).toContain('winter-prune');
    expect(old).not.toContain('formative-prune');
    expect(at({ typeCode: 'apple', form: 'bush', plantedYear: 2022 })).toContain('formative-prune'); // third season after planting
    expect(at({ typeCode: 'apple', form: 'bush', plantedYear: 2021 })).not.toContain('formative-prune');
  });

  it('treats a plant with no planted year as established, and one planted later as absent', () => {
    expect(at({ typeCode: 'apple', form: 'bush' })).toContain('winter-prune');
    expect(at({ typeCode: 'apple', form: 'bush', plantedYear: 2026 })).toEqual([]);
  });

  it('adds a summer remedial cut for silver leaf, cutting 10–15 cm beyond the stain (RHS, "Silver leaf", S1; item 26)', () => {
    expect(at({ typeCode: 'plum', form: 'bush', plantedYear: 2010 })).not.toContain('remedial-silver-leaf');
    const windows = seasonWindows({ plant: { typeCode: 'plum', form: 'bush', plantedYear: 2010, healthFlags: ['silver-leaf'] }, site: LONDON, season: 2025, on: '2025-06-01' });
    const w = find(windows, 'remedial-silver-leaf');
    expect([w.task, w.opens, w.closes]).toEqual(['remedial-cut', '2025-06-01', '2025-08-31']);
    expect(w.detail).toContain('10–15 cm beyond the end of the dark stain');
    expect(w.source).toContain('[S1]');
  });

  it('cuts canker out of stone fruit in summer and out of pome fruit in winter', () => {
    const plum = seasonWindows({ plant: { typeCode: 'plum', form: 'bush', healthFlags: ['canker'] }, site: LONDON, season: 2025 });
    expect(find(plum, 'remedial-canker').opens).toBe('2025-06-01');
    const apple = seasonWindows({ plant: { typeCode: 'apple', form: 'bush', healthFlags: ['canker'] }, site: LONDON, season: 2025 });
    expect(find(apple, 'remedial-winter').opens).toBe('2024-11-01');
  });

  it('gives every type some windows in a usual form', () => {
    const usualForm = (code: PlantTypeCode): PlantInput['form'] =>
      catalogue[code].group === 'vine' ? 'vine-rod-and-spur' : catalogue[code].group === 'cane' ? 'cane-row' : 'bush';
    for (const code of plantTypeCodes) expect(at({ typeCode: code, form: usualForm(code), plantedYear: 2010 }).length, code).toBeGreaterThan(2);
  });
});

describe('degree-day triggers', () => {
  it('opens trained-pear summer pruning when growth stops, saying so in degree-days', () => {
    const readings = readingsLikeNormals('2025-01-01', '2025-09-30', 0);
    const w = find(seasonWindows({ plant: trainedPear, site: LONDON, season: 2025, readings, on: '2025-08-01' }), 'summer-prune');
    expect(w.basis).toBe('readings');
    expect(w.triggeredBy).toMatchObject({ degreeDays: 1200, base: 5, since: '2025-01-01', reachedOn: w.opens });
    expect(w.reason).toContain(`Growth has stopped on trained pears: 1200 degree-days since 1 January (base 5 °C), reached on ${formatDay(w.opens)}`);
    // RHS, "Summer pruning fruit trees" (S6): trained pears late July – early August.
    expect(w.opens >= '2025-07-20' && w.opens <= '2025-07-31').toBe(true);
    expect(daysBetween(w.opens, w.closes)).toBe(16);
  });

  it('opens trained-apple summer pruning in mid-August in an average lowland-England year (RHS, S6; item 32)', () => {
    const w = find(seasonWindows({ plant: { typeCode: 'apple', form: 'cordon' }, site: LONDON, season: 2025 }), 'summer-prune');
    expect(w.opens >= '2025-08-12' && w.opens <= '2025-08-18').toBe(true);
  });

  it('closes free-standing apple winter pruning at green tip, 67 degree-days base 6.1 °C from 1 March (UMass, "Predicting green tip?", 2019; item 33)', () => {
    const w = find(seasonWindows({ plant: { typeCode: 'apple', form: 'standard' }, site: LONDON, season: 2025 }), 'winter-prune');
    expect(w.opens).toBe('2024-11-01');
    expect(w.closes >= '2025-03-01' && w.closes <= '2025-04-30').toBe(true);
    expect(w.triggeredBy).toMatchObject({ degreeDays: 67, base: 6.1, since: '2025-03-01' });
    const ss = siteSeason(LONDON, 2025);
    expect(degreeDaysBetween(ss, 6.1, '2025-03-01', w.closes)).toBeGreaterThanOrEqual(67);
    expect(degreeDaysBetween(ss, 6.1, '2025-03-01', addDays(w.closes, -1))).toBeLessThan(67);
  });

  it('opens a degree-day window earlier in a season 3 °C warmer', () => {
    const cool = readingsLikeNormals('2025-01-01', '2025-12-31', 0);
    const warm = readingsLikeNormals('2025-01-01', '2025-12-31', 3);
    for (const [plant, key] of [[trainedPear, 'summer-prune'], [{ typeCode: 'grape', form: 'vine-guyot' }, 'bunch-thinning'], [{ typeCode: 'apple', form: 'bush' }, 'fruit-thinning']] as const) {
      const coolWindow = find(seasonWindows({ plant, site: LONDON, season: 2025, readings: cool }), key);
      const warmWindow = find(seasonWindows({ plant, site: LONDON, season: 2025, readings: warm }), key);
      expect(warmWindow.opens < coolWindow.opens, key).toBe(true);
      expect(warmWindow.basis).toBe('readings');
    }
  });

  it('says projection when the trigger falls after the last reading, readings when before', () => {
    const spring = readingsLikeNormals('2025-01-01', '2025-04-30', 0);
    const projected = find(seasonWindows({ plant: trainedPear, site: LONDON, season: 2025, readings: spring }), 'summer-prune');
    expect(projected.basis).toBe('projection');
    expect(projected.triggeredBy?.reachedOn).toBe(projected.opens);
    expect(projected.reason).toMatch(/expected to stop around .*\(projected from built-in normals for lowland southern England\)/);
    const measured = find(seasonWindows({ plant: trainedPear, site: LONDON, season: 2025, readings: readingsLikeNormals('2025-01-01', '2025-08-31', 0) }), 'summer-prune');
    expect(measured.basis).toBe('readings');
    const mulch = find(seasonWindows({ plant: trainedPear, site: LONDON, season: 2025, readings: spring }), 'mulch-spring');
    expect(mulch.basis).toBe('calendar');
    expect(mulch.triggeredBy).toBeUndefined();
  });

  it('falls back on the latest usual date at a site too cold to reach the total', () => {
    const cold = dateRange('2025-01-01', '2025-12-31').map((date) => ({ date, tmin: -2, tmax: 6 }));
    const w = find(seasonWindows({ plant: trainedPear, site: LONDON, season: 2025, readings: cold }), 'summer-prune');
    expect(w.opens).toBe('2025-08-15');
    expect(w.basis).toBe('calendar');
    expect(w.triggeredBy?.reachedOn).toBeUndefined();
    expect(w.reason).toContain('1200 degree-days since 1 January (base 5 °C) are not reached by then');
  });
});

describe('southern hemisphere (site at −37.8°)', () => {
  const plants: PlantInput[] = [
    { typeCode: 'apple', form: 'espalier', plantedYear: 2010 },
    { typeCode: 'cherry-sweet', form: 'fan', plantedYear: 2010 },
    { typeCode: 'grape', form: 'vine-guyot', plantedYear: 2010 },
    { typeCode: 'plum', form: 'pyramid', plantedYear: 2024, healthFlags: ['silver-leaf'] },
    { typeCode: 'raspberry-summer', form: 'cane-row' },
  ];

  it.each(plants.map((p) => [p.typeCode, p] as const))('%s gets the same windows six months later', (_code, plant) => {
    const north = seasonWindows({ plant, site: LONDON, season: 2025 });
    const south = seasonWindows({ plant, site: MELBOURNE, season: 2025 });
    expect(south.map((w) => w.key).sort()).toEqual(north.map((w) => w.key).sort());
    for (const n of north) {
      const s = find(south, n.key);
      if (n.basis === 'calendar') {
        expect([s.opens, s.closes], n.key).toEqual([sixMonthsOn(n.opens), sixMonthsOn(n.closes)]);
      } else {
        // Degree-day windows: the shifted normals give the same totals within a couple of days.
        expect(Math.abs(daysBetween(sixMonthsOn(n.opens), s.opens)), n.key).toBeLessThanOrEqual(3);
      }
    }
  });

  it('accumulates degree-days from 1 July', () => {
    const ss = siteSeason(MELBOURNE, 2025);
    expect(ss.temperatures.start).toBe('2025-07-01');
    expect(triggerOutcome(ss, 'pear-shoots-stopped')?.since).toBe('2025-07-01');
    expect(triggerOutcome(ss, 'apple-green-tip')?.since).toBe('2025-09-01');
    const w = find(seasonWindows({ plant: trainedPear, site: MELBOURNE, season: 2025 }), 'summer-prune');
    expect(w.reason).toContain('since 1 July (base 5 °C)');
  });

  it('rewords the months in reasons and details', () => {
    const w = find(seasonWindows({ plant: { typeCode: 'grape', form: 'vine-guyot' }, site: MELBOURNE, season: 2025 }), 'leaf-picking');
    expect(w.reason).toBe('Pick vine leaves for cooking from about mid-November to mid-February.');
    expect(calendarDate({ month: 11, day: 1, yearOffset: -1 }, 2025, 'south')).toBe('2025-05-01');
  });
});

describe('agreement with the stone-fruit check', () => {
  const stone = plantTypeCodes.filter((c) => catalogue[c].group === 'stone');

  it.each(stone)('every day of %s’s pruning windows is safe by the check, in both hemispheres (UK rules, care-rules.md §3)', (code) => {
    for (const site of [LONDON, MELBOURNE]) {
      for (const [plantedYear, ageYears] of [[2010, 15], [2024, 1]] as const) {
        const windows = seasonWindows({ plant: { typeCode: code, form: 'pyramid', plantedYear }, site, season: 2024 });
        const pruning = windows.filter((x) => x.task === 'stone-fruit-prune' || x.task === 'formative-prune');
        expect(pruning.length).toBeGreaterThan(0);
        for (const w of pruning) {
          for (const date of dateRange(w.opens, w.closes)) {
            expect(checkStoneFruitCut({ type: code, date, latitude: site.latitude, ageYears }).verdict, `${code} ${w.key} ${date}`).toBe('ok');
          }
        }
      }
    }
  });
});

describe('fast path', () => {
  it('gives the same windows as the one-call form', () => {
    const readings = readingsLikeNormals('2025-01-01', '2025-06-30', 1.5);
    const ss = siteSeason(LONDON, 2025, readings);
    for (const plant of [trainedPear, { typeCode: 'grape', form: 'vine-guyot' }, { typeCode: 'gooseberry', form: 'cordon', healthFlags: ['dead-wood'] }] as PlantInput[]) {
      expect(windowsForPlant(plant, ss, '2025-07-01')).toEqual(seasonWindows({ plant, site: LONDON, season: 2025, readings, on: '2025-07-01' }));
      expect(seasonWindows({ plant, site: LONDON, season: 2025, on: '2025-07-01', accumulation: ss })).toEqual(windowsForPlant(plant, ss, '2025-07-01'));
    }
  });

  it('refuses an accumulation for another season', () => {
    const ss = siteSeason(LONDON, 2024);
    expect(() => seasonWindows({ plant: trainedPear, site: LONDON, season: 2025, accumulation: ss })).toThrow(CareInputError);
  });

  it('keeps windows ordered and well formed for any plant and day', () => {
    const ss = siteSeason(LONDON, 2025);
    fc.assert(
      fc.property(fc.constantFrom(...plantTypeCodes), fc.constantFrom(...plantForms), fc.integer({ min: 2000, max: 2025 }), fc.integer({ min: -200, max: 560 }), (typeCode, form, plantedYear, offset) => {
        const on = addDays('2025-01-01', offset);
        const windows = windowsForPlant({ typeCode, form, plantedYear }, ss, on);
        return windows.every((w, i) => w.opens <= w.closes && w.state === windowState(w.opens, w.closes, on) && w.source.length > 0 && (i === 0 || (windows[i - 1] as Window).opens <= w.opens));
      }),
      { numRuns: 300 },
    );
  });
});

describe('bad input', () => {
  it('rejects an unknown type, form or date', () => {
    const plant = { ...trainedPear, typeCode: 'banana' as PlantTypeCode };
    expect(() => seasonWindows({ plant, site: LONDON, season: 2025 })).toThrow(CareInputError);
    expect(() => seasonWindows({ plant: { ...trainedPear, form: 'hedge' as PlantInput['form'] }, site: LONDON, season: 2025 })).toThrow(CareInputError);
    expect(() => seasonWindows({ plant: trainedPear, site: LONDON, season: 2025, on: '2025-02-30' })).toThrow(/YYYY-MM-DD/);
  });
});
