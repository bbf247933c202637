import { describe, expect, it } from 'vitest';
import {
  CareInputError,
  accumulate,
  accumulateExtremes,
  celsiusToFahrenheit,
  degreeDaySeries,
  degreeDaysForDay,
  degreeDaysToCelsius,
  degreeDaysToFahrenheit,
  fahrenheitToCelsius,
  winklerIndex,
  winklerRegion,
  type Cutoff,
  type DailyTemperature,
  type DegreeDayMethod,
} from '../../server/care/degree-days';
import { dateRange } from '../../server/care/dates';

const CURVE_METHODS: DegreeDayMethod[] = ['single-sine', 'double-sine', 'single-triangle', 'double-triangle'];
const ALL_METHODS: DegreeDayMethod[] = ['average', ...CURVE_METHODS];

/** Published values are printed to two decimals; the UC IPM rows allow ±0.011 for rounding of .xx5 values. */
function expectPublished(actual: number, expected: number, tolerance = 0.0051): void {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(tolerance);
}

describe('degreeDaysForDay — Zalom et al. 1983, UC DANR Leaflet 21373, Table 7 (°F, TL 55, TU 90, horizontal)', () => {
  const f = { lower: 55, upper: 90 } as const;

  // Zalom et al. 1983, UC DANR Leaflet 21373, Table 7: Tn 50, Tx 82, Tn′ 45
  it.each([
    ['single-sine', 11.85],
    ['single-triangle', 11.39],
    ['double-sine', 11.31],
    ['double-triangle', 10.62],
  ] as const)('Tn 50, Tx 82, Tn′ 45 by %s gives %s', (method, expected) => {
    expectPublished(degreeDaysForDay(50, 82, 45, { method, ...f }), expected);
  });

  it('single sine with both thresholds crossed (Tn 50, Tx 101) gives 18.95', () => {
    // Zalom et al. 1983, UC DANR Leaflet 21373, Table 7 (single sine, case 6)
    expectPublished(degreeDaysForDay(50, 101, undefined, { method: 'single-sine', ...f }), 18.95);
  });

  it('single sine with the upper threshold crossed (Tn 60, Tx 100) gives 22.82', () => {
    // Zalom et al. 1983, UC DANR Leaflet 21373, Table 7 (single sine, case 5)
    expectPublished(degreeDaysForDay(60, 100, undefined, { method: 'single-sine', ...f }), 22.82);
  });

  it('double sine with both halves between the thresholds (Tn 60, Tx 80, Tn′ 75) gives 18.75', () => {
    // Zalom et al. 1983, UC DANR Leaflet 21373, Table 7 (double sine, case 3 in both halves)
    expectPublished(degreeDaysForDay(60, 80, 75, { method: 'double-sine', ...f }), 18.75);
  });

  it.each(ALL_METHODS)('a day entirely above both thresholds (96/110, Tn′ 91) gives 35.00 by %s', (method) => {
    // Zalom et al. 1983, UC DANR Leaflet 21373, Table 7 (case 1, every method)
    expect(degreeDaysForDay(96, 110, 91, { method, ...f })).toBeCloseTo(35, 10);
  });

  it.each(ALL_METHODS)('a day entirely below the lower threshold (38/50, Tn′ 45) gives 0 by %s', (method) => {
    // Zalom et al. 1983, UC DANR Leaflet 21373, Table 7 (case 2, every method)
    expect(degreeDaysForDay(38, 50, 45, { method, ...f })).toBe(0);
  });
});

describe('degreeDaysForDay — average method (McMaster & Wilhelm 1997, Agric. For. Meteorol. 87, Table 1, method 1, base 0 °C)', () => {
  // McMaster & Wilhelm 1997, Agric. For. Meteorol. 87:291–300, Table 1, all ten rows, method 1
  it.each([
    [20, 10, 15.0],
    [10, 1, 5.5],
    [8, -2, 3.0],
    [6, 0, 3.0],
    [10, 5, 7.5],
    [5, -5, 0.0],
    [-2, -7, 0.0],
    [-5, -10, 0.0],
    [10, -2, 4.0],
    [15, 2, 8.5],
  ])('Tx %s, Tn %s gives %s', (tmax, tmin, expected) => {
    expect(degreeDaysForDay(tmin, tmax, undefined, { method: 'average', lower: 0 })).toBeCloseTo(expected, 10);
  });

  it('caps both extremes at the upper threshold before averaging', () => {
    // Design choice stated in the brief; Tn 20, Tx 40, TU 30: (20 + 30)/2 − 10 = 15 (not (20 + 40)/2 − 10 = 20)
    expect(degreeDaysForDay(20, 40, undefined, { method: 'average', lower: 10, upper: 30 })).toBe(15);
  });

  it('gives 4.00 for Tn 6, Tx 22 °C, base 10 with TU 30', () => {
    // degree-days.md §2.2 row 19 [computed] (McMaster & Wilhelm 1997 method 1)
    expect(degreeDaysForDay(6, 22, undefined, { method: 'average', lower: 10, upper: 30 })).toBe(4);
  });
});

type Row = Record<`${'single' | 'double'}-${'sine' | 'triangle'}`, [number, number, number]>;

// UC IPM online degree-day calculator output for the Esparto-A CIMIS station, 2020, TL 50 °F,
// TU 70 °F, as published in the UCANR-IGIS "degree-day-challenge" ucipm_low50_high70_all.csv.
// Each triple is horizontal / vertical / intermediate.
const UC_IPM_ROWS: { date: string; tmin: number; tmax: number; nextTmin: number; values: Row }[] = [
  {
    date: '2020-01-01', tmin: 38, tmax: 55, nextTmin: 36,
    values: { 'single-sine': [1.19, 1.19, 1.19], 'double-sine': [1.15, 1.15, 1.15], 'single-triangle': [0.74, 0.74, 0.74], 'double-triangle': [0.7, 0.7, 0.7] },
  },
  {
    date: '2020-02-27', tmin: 43, tmax: 77, nextTmin: 43,
    values: { 'single-sine': [10, 4, 8.62], 'double-sine': [10, 4, 8.62], 'single-triangle': [10, 5.88, 9.28], 'double-triangle': [10, 5.88, 9.28] },
  },
  {
    date: '2020-03-03', tmin: 46, tmax: 81, nextTmin: 41,
    values: { 'single-sine': [11.37, 3.79, 8.66], 'double-sine': [10.85, 3.55, 8.24], 'single-triangle': [12, 5.71, 10.27], 'double-triangle': [11.25, 5.36, 9.63] },
  },
  {
    date: '2020-05-14', tmin: 50, tmax: 70, nextTmin: 56,
    values: { 'single-sine': [10, 10, 10], 'double-sine': [11.5, 11.5, 11.5], 'single-triangle': [10, 10, 10], 'double-triangle': [11.5, 11.5, 11.5] },
  },
  {
    date: '2020-07-11', tmin: 59, tmax: 103, nextTmin: 59,
    values: { 'single-sine': [17.6, 4.27, 4.27], 'double-sine': [17.6, 4.27, 4.27], 'single-triangle': [18.63, 3.63, 6.25], 'double-triangle': [18.63, 3.63, 6.25] },
  },
  {
    date: '2020-08-14', tmin: 71, tmax: 103, nextTmin: 68,
    values: { 'single-sine': [20, 0, 3], 'double-sine': [19.9, 1.43, 3.55], 'single-triangle': [20, 0, 3], 'double-triangle': [19.97, 0.54, 3.69] },
  },
  {
    date: '2020-12-21', tmin: 31, tmax: 50, nextTmin: 38,
    values: { 'single-sine': [0, 0, 0], 'double-sine': [0, 0, 0], 'single-triangle': [0, 0, 0], 'double-triangle': [0, 0, 0] },
  },
];

const CUTOFFS: Cutoff[] = ['horizontal', 'vertical', 'intermediate'];

describe('degreeDaysForDay — UC IPM calculator, Esparto-A 2020 (°F, TL 50, TU 70), all 12 method × cutoff pairs', () => {
  for (const row of UC_IPM_ROWS) {
    for (const method of CURVE_METHODS) {
      CUTOFFS.forEach((cutoff, k) => {
        const expected = row.values[method as keyof Row][k] as number;
        it(`${row.date} ${method} ${cutoff} gives ${expected.toFixed(2)}`, () => {
          const dd = degreeDaysForDay(row.tmin, row.tmax, row.nextTmin, { method, cutoff, lower: 50, upper: 70 });
          expectPublished(dd, expected, 0.011);
        });
      });
    }
  }
});

describe('degreeDaysForDay — TrenchR documentation examples (7/14 °C, TL 12, TU 33)', () => {
  it('single sine gives 0.47 and single triangle 0.29', () => {
    // TrenchR R package documentation, degree_days(7, 14, 12, 33, "single.sine" / "single.triangle")
    expectPublished(degreeDaysForDay(7, 14, undefined, { method: 'single-sine', lower: 12, upper: 33 }), 0.47);
    expectPublished(degreeDaysForDay(7, 14, undefined, { method: 'single-triangle', lower: 12, upper: 33 }), 0.29);
  });
});

describe('degreeDaysForDay — computed check values (degree-days.md §2.2 and §7, numeric integration agrees)', () => {
  const c = { lower: 10, upper: 30 } as const;
  const cases: [DegreeDayMethod, number, number, number | undefined, [number, number, number], number][] = [
    // degree-days.md §7 row 18 [computed]: single sine Tn 8, Tx 38 °C, 10/30
    ['single-sine', 8, 38, undefined, [11.416, 4.5069, 9.6113], 1e-4],
    // degree-days.md §2.2 row 13 [computed]: single triangle, same day (printed to 2 decimals)
    ['single-triangle', 8, 38, undefined, [12.0, 6.67, 10.93], 0.0051],
    // degree-days.md §7 row 19 [computed]: double sine with Tn′ 14
    ['double-sine', 8, 38, 14, [12.691, 5.3182, 10.7717], 1e-4],
    // degree-days.md §2.2 row 15 [computed]: double triangle with Tn′ 14
    ['double-triangle', 8, 38, 14, [13.33, 7.33, 12.13], 0.0051],
    // degree-days.md §2.2 row 16 [computed]: the minimum above the upper threshold
    ['single-sine', 31, 40, undefined, [20, 0, 14.5], 1e-4],
    // degree-days.md §2.2 row 20 [computed]: upper threshold intercepted
    ['single-sine', 18, 36, undefined, [15.47, 7.64, 13.95], 0.0051],
  ];
  for (const [method, tmin, tmax, next, values, tol] of cases) {
    CUTOFFS.forEach((cutoff, k) => {
      it(`${method} ${tmin}/${tmax}${next === undefined ? '' : ` Tn′ ${next}`} ${cutoff} gives ${values[k]}`, () => {
        expectPublished(degreeDaysForDay(tmin, tmax, next, { method, cutoff, ...c }), values[k] as number, tol);
      });
    });
  }

  it('single sine with no upper threshold gives 4.8720 and single triangle 4.5000 for 6/22 °C over 10', () => {
    // degree-days.md §7 row 20 [computed]
    expectPublished(degreeDaysForDay(6, 22, undefined, { method: 'single-sine', lower: 10 }), 4.872, 1e-4);
    expectPublished(degreeDaysForDay(6, 22, undefined, { method: 'single-triangle', lower: 10 }), 4.5, 1e-4);
  });

  it('ignores the cutoff when there is no upper threshold', () => {
    const horizontal = degreeDaysForDay(6, 40, undefined, { method: 'single-sine', lower: 10 });
    expect(degreeDaysForDay(6, 40, undefined, { method: 'single-sine', lower: 10, cutoff: 'vertical' })).toBe(horizontal);
    expect(Number.isFinite(horizontal)).toBe(true);
  });

  it('treats a day with equal extremes as a flat line', () => {
    expect(degreeDaysForDay(15, 15, undefined, { method: 'single-sine', lower: 10 })).toBe(5);
    expect(degreeDaysForDay(10, 10, undefined, { method: 'single-triangle', lower: 10 })).toBe(0);
  });

  it('double methods use today’s minimum when the next one is missing', () => {
    const single = degreeDaysForDay(46, 81, undefined, { method: 'single-sine', lower: 50, upper: 70 });
    expect(degreeDaysForDay(46, 81, undefined, { method: 'double-sine', lower: 50, upper: 70 })).toBe(single);
  });
});

describe('°F and °C give the same heat', () => {
  const days: [number, number, number][] = [
    [8, 38, 14],
    [-3, 12, 2],
    [11, 19, 9],
    [21, 35, 24],
  ];
  for (const method of ALL_METHODS) {
    for (const cutoff of CUTOFFS) {
      it(`${method} ${cutoff}: °F·days = 1.8 × °C·days`, () => {
        for (const [tmin, tmax, next] of days) {
          const c = degreeDaysForDay(tmin, tmax, next, { method, cutoff, lower: 10, upper: 30 });
          const f = degreeDaysForDay(celsiusToFahrenheit(tmin), celsiusToFahrenheit(tmax), celsiusToFahrenheit(next), {
            method, cutoff, lower: 50, upper: 86,
          });
          expect(f).toBeCloseTo(degreeDaysToFahrenheit(c), 9);
          expect(degreeDaysToCelsius(f)).toBeCloseTo(c, 9);
        }
      });
    }
  }

  it('converts temperatures both ways', () => {
    expect(celsiusToFahrenheit(10)).toBe(50);
    expect(celsiusToFahrenheit(-40)).toBe(-40);
    expect(fahrenheitToCelsius(212)).toBeCloseTo(100, 12);
  });
});

describe('bad input', () => {
  it('throws CareInputError with a path when the minimum is above the maximum', () => {
    expect(() => degreeDaysForDay(20, 10, undefined, { method: 'single-sine', lower: 10 })).toThrow(CareInputError);
    try {
      degreeDaySeries([{ date: '2026-05-01', tmin: 5, tmax: 10 }, { date: '2026-05-02', tmin: 12, tmax: 11 }], { method: 'average', lower: 10 });
      expect.unreachable();
    } catch (err) {
      expect(err).toBeInstanceOf(CareInputError);
      expect((err as CareInputError).path).toBe('days.1.tmin');
    }
  });

  it('throws when the upper threshold is not above the lower one', () => {
    for (const upper of [10, 5]) {
      try {
        accumulate([], { method: 'single-triangle', lower: 10, upper });
        expect.unreachable();
      } catch (err) {
        expect(err).toBeInstanceOf(CareInputError);
        expect((err as CareInputError).path).toBe('upper');
      }
    }
  });

  it('throws on temperatures that are not numbers', () => {
    expect(() => degreeDaysForDay(Number.NaN, 10, undefined, { method: 'average', lower: 0 })).toThrow(/minimum/);
    expect(() => accumulate([{ date: '2026-01-01', tmin: 1, tmax: Number.POSITIVE_INFINITY }], { method: 'average', lower: 0 })).toThrow(/maximum/);
  });
});

function season(from: string, to: string, tmin: (i: number) => number, tmax: (i: number) => number): DailyTemperature[] {
  return dateRange(from, to).map((date, i) => ({ date, tmin: tmin(i), tmax: tmax(i) }));
}

describe('degreeDaySeries and accumulate', () => {
  const days = season('2026-03-01', '2026-03-31', (i) => 2 + (i % 7), (i) => 12 + ((i * 3) % 11));

  it('keeps the order given and uses the next element’s minimum for double methods', () => {
    const options = { method: 'double-sine', lower: 5, upper: 25 } as const;
    const series = degreeDaySeries(days, options);
    expect(series.days.map((d) => d.date)).toEqual(days.map((d) => d.date));
    const day3 = days[3] as DailyTemperature;
    expect(series.days[3]?.dd).toBe(degreeDaysForDay(day3.tmin, day3.tmax, days[4]?.tmin, options));
    const last = days[days.length - 1] as DailyTemperature;
    expect(series.days[days.length - 1]?.dd).toBe(degreeDaysForDay(last.tmin, last.tmax, last.tmin, options));
  });

  it('accumulates to the same totals as the series, and from typed arrays too', () => {
    for (const method of ALL_METHODS) {
      const options = { method, cutoff: 'intermediate', lower: 5, upper: 14 } as const;
      const series = degreeDaySeries(days, options);
      const running = accumulate(days, options);
      const fromArrays = accumulateExtremes(Float64Array.from(days, (d) => d.tmin), Float64Array.from(days, (d) => d.tmax), options);
      expect(running.length).toBe(days.length);
      series.days.forEach((d, i) => {
        expect(running[i]).toBeCloseTo(d.cumulative, 10);
        expect(fromArrays[i]).toBe(running[i]);
      });
      expect(series.total).toBeCloseTo(running[days.length - 1] as number, 10);
      expect(series.total).toBeGreaterThan(0);
    }
  });

  it('gives an empty result for no days', () => {
    expect(degreeDaySeries([], { method: 'average', lower: 10 })).toEqual({ total: 0, days: [] });
    expect(accumulate([], { method: 'average', lower: 10 }).length).toBe(0);
  });
});

describe('winklerIndex and winklerRegion', () => {
  it('sums 9 °C·days a day over 1 April–31 October to 1926 (Region III)', () => {
    // degree-days.md §3.1 worked example [computed]: Tn 12, Tx 26 °C daily, 214 days → 1926 °C·d = 3466.8 °F·d
    const days = season('2025-01-01', '2025-12-31', () => 12, () => 26);
    const index = winklerIndex(days, 'north');
    expect(index).toBeCloseTo(1926, 6);
    expect(degreeDaysToFahrenheit(index)).toBeCloseTo(3466.8, 6);
    expect(winklerRegion(index).region).toBe('III');
    expect(winklerRegion(3466.8, 'F').region).toBe('III');
  });

  it('uses 1 October–30 April in the south (212 days in 2025–26)', () => {
    const days = season('2025-07-01', '2026-06-30', () => 12, () => 26);
    expect(winklerIndex(days, 'south')).toBeCloseTo(9 * 212, 6);
  });

  it('counts no negative days', () => {
    const days = season('2025-04-01', '2025-04-10', () => 0, () => 10);
    expect(winklerIndex(days, 'north')).toBe(0);
  });

  // Amerine & Winkler 1944, Hilgardia 15 (regions II–IV, upper bound of I/Ib) and Jones et al. 2010,
  // Am. J. Enol. Vitic. 61 (Ia 1500–2000, Ib 2001–2500, V 4001–4900 °F·days); bounds belong to the band below.
  it.each([
    [1499, 'too cool'],
    [1500, 'Ia'],
    [2000, 'Ia'],
    [2000.01, 'Ib'],
    [2500, 'Ib'],
    [2500.01, 'II'],
    [3000, 'II'],
    [3000.01, 'III'],
    [3500, 'III'],
    [3500.01, 'IV'],
    [4000, 'IV'],
    [4000.01, 'V'],
    [4900, 'V'],
    [4900.01, 'too hot'],
  ] as const)('%s °F·days is %s', (fahrenheitIndex, region) => {
    expect(winklerRegion(fahrenheitIndex, 'F').region).toBe(region);
    expect(winklerRegion(fahrenheitIndex / 1.8, 'C').region).toBe(region);
  });

  it('labels a region with its °C range and names its source', () => {
    const iii = winklerRegion(1926);
    expect(iii.label).toBe('Region III (1667–1944 °C·days)');
    expect(iii.source).toMatch(/Amerine & Winkler 1944/);
    expect(winklerRegion(900).source).toMatch(/Jones et al\. 2010/);
  });
});
