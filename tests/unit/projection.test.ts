import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  TEMPERATE_DEFAULT_LABEL, TEMPERATE_DEFAULT_NORMALS, dailyNormals, defaultNormals, projectSeason, projectSeasonDays,
  seasonDays, seasonEnd, seasonStart, type MonthlyNormal,
} from '../../server/care/projection';
import { CareInputError, type DailyTemperature } from '../../server/care/degree-days';
import { addDays, dateRange, daysBetween } from '../../server/care/dates';

// A made-up climate with a clear seasonal swing, so interpolation errors show.
const SITE_NORMALS: MonthlyNormal[] = [
  [0, 6], [1, 8], [3, 12], [5, 15], [8, 19], [11, 22], [13, 25], [13, 24], [10, 20], [7, 15], [3, 10], [1, 7],
].map(([tmin, tmax], i) => ({ month: i + 1, tmin: tmin as number, tmax: tmax as number }));

function dayOf(days: ReturnType<typeof seasonDays>, date: string) {
  const day = days.find((d) => d.date === date);
  if (!day) throw new Error(`no day ${date}`);
  return day;
}

describe('season bounds', () => {
  it('runs a northern season from 1 January to 31 December', () => {
    expect(seasonStart(2025, 'north')).toBe('2025-01-01');
    expect(seasonEnd(2025, 'north')).toBe('2025-12-31');
    expect(projectSeason({ season: 2024, latitude: 52 }).length).toBe(366);
  });

  it('runs a southern season from 1 July to 30 June', () => {
    expect(seasonStart(2025, 'south')).toBe('2025-07-01');
    expect(seasonEnd(2025, 'south')).toBe('2026-06-30');
    expect(projectSeason({ season: 2023, latitude: -37 }).length).toBe(366); // holds 29 February 2024
  });
});

describe('normals between mid-months', () => {
  it('meets each month’s normal in the middle of the month', () => {
    const days = projectSeasonDays({ season: 2025, latitude: 52, normals: SITE_NORMALS });
    expect(dayOf(days, '2025-01-16')).toMatchObject({ tmin: 0, tmax: 6, source: 'projected' });
    expect(dayOf(days, '2025-07-16')).toMatchObject({ tmin: 13, tmax: 25 });
    expect(dayOf(days, '2025-12-16')).toMatchObject({ tmin: 1, tmax: 7 });
  });

  it('moves smoothly across a month boundary instead of stepping', () => {
    const steep: MonthlyNormal[] = SITE_NORMALS.map((n) => (n.month === 2 ? { month: 2, tmin: 20, tmax: 30 } : n));
    const { tmax } = dailyNormals('2025-01-25', '2025-02-05', steep);
    const jumps = tmax.slice(1).map((v, i) => Math.abs(v - (tmax[i] as number)));
    // Jan 6 → Feb 30 over the 29.5 days between the two mid-months: under a degree a day.
    expect(Math.max(...jumps)).toBeLessThan(1);
    expect(tmax[6]).toBeGreaterThan(6); // 31 January is already on its way up
    expect(tmax[7]).toBeLessThan(30); // 1 February is not yet at February's normal
  });

  it('wraps from December into January', () => {
    const { tmin } = dailyNormals('2024-12-30', '2025-01-02', SITE_NORMALS);
    expect(tmin.every((v) => v >= 0 && v <= 1)).toBe(true);
  });

  it('never leaves the range the normals span', () => {
    const normal = fc.record({ tmin: fc.double({ min: -20, max: 20, noNaN: true }), spread: fc.double({ min: 0, max: 20, noNaN: true }) });
    fc.assert(
      fc.property(fc.array(normal, { minLength: 12, maxLength: 12 }), (values) => {
        const normals = values.map((v, i) => ({ month: i + 1, tmin: v.tmin, tmax: v.tmin + v.spread }));
        const series = projectSeason({ season: 2025, latitude: 50, normals });
        const lo = Math.min(...normals.map((n) => n.tmin)) - 1e-9;
        const hi = Math.max(...normals.map((n) => n.tmax)) + 1e-9;
        return series.tmin.every((t, i) => t >= lo && t <= (series.tmax[i] as number) && (series.tmax[i] as number) <= hi);
      }),
      { numRuns: 50 },
    );
  });
});

describe('the built-in temperate default', () => {
  it('stands in when a site has no normals, and says so', () => {
    const series = projectSeason({ season: 2025, latitude: 51.5 });
    expect(series.normalsOrigin).toBe('default');
    expect(series.normalsLabel).toBe(TEMPERATE_DEFAULT_LABEL);
    const july = TEMPERATE_DEFAULT_NORMALS.find((n) => n.month === 7);
    expect(dayOf(seasonDays(series), '2025-07-16')).toMatchObject({ tmin: july?.tmin, tmax: july?.tmax });
  });

  it('moves six months on for a southern site: mid-January there is mid-July here', () => {
    expect(defaultNormals(-37).find((n) => n.month === 1)).toEqual({ ...TEMPERATE_DEFAULT_NORMALS[6], month: 1 });
    const south = seasonDays(projectSeason({ season: 2025, latitude: -37 }));
    const july = TEMPERATE_DEFAULT_NORMALS.find((n) => n.month === 7);
    expect(dayOf(south, '2026-01-16')).toMatchObject({ tmin: july?.tmin, tmax: july?.tmax });
    expect(projectSeason({ season: 2025, latitude: -37 }).normalsLabel).toMatch(/six months/);
  });

  it('prefers the site’s own normals', () => {
    const series = projectSeason({ season: 2025, latitude: 51.5, normals: SITE_NORMALS });
    expect(series.normalsOrigin).toBe('site');
    expect(series.normalsLabel).toMatch(/site/);
  });
});

describe('readings and projection', () => {
  const readings: DailyTemperature[] = dateRange('2025-03-01', '2025-03-10').map((date, i) => ({ date, tmin: i, tmax: 20 + i }));

  it('uses each reading on its day and projects the rest', () => {
    const series = projectSeason({ season: 2025, latitude: 52, readings, normals: SITE_NORMALS });
    const days = seasonDays(series);
    expect(series.readingCount).toBe(10);
    expect(dayOf(days, '2025-03-04')).toEqual({ date: '2025-03-04', tmin: 3, tmax: 23, source: 'reading' });
    expect(dayOf(days, '2025-03-11').source).toBe('projected');
    expect(days.filter((d) => d.source === 'reading').map((d) => d.date)).toEqual(readings.map((r) => r.date));
  });

  it('places readings given out of order', () => {
    const shuffled = [...readings].reverse();
    const series = projectSeason({ season: 2025, latitude: 52, readings: shuffled });
    expect(dayOf(seasonDays(series), '2025-03-01')).toMatchObject({ tmin: 0, tmax: 20, source: 'reading' });
    expect(series.readingCount).toBe(10);
  });

  it('ignores readings from another season and counts a repeated day once (the later wins)', () => {
    const extra = [{ date: '2024-12-31', tmin: 1, tmax: 2 }, { date: '2025-03-01', tmin: 5, tmax: 9 }];
    const series = projectSeason({ season: 2025, latitude: 52, readings: [...readings, ...extra] });
    expect(series.readingCount).toBe(10);
    expect(dayOf(seasonDays(series), '2025-03-01')).toMatchObject({ tmin: 5, tmax: 9 });
  });

  it('keeps every reading exactly, whatever the subset', () => {
    const start = '2025-01-01';
    fc.assert(
      fc.property(fc.uniqueArray(fc.integer({ min: 0, max: 364 }), { maxLength: 60 }), fc.double({ min: -10, max: 10, noNaN: true }), (offsets, t) => {
        const given = offsets.map((o) => ({ date: addDays(start, o), tmin: t, tmax: t + 5 }));
        const series = projectSeason({ season: 2025, latitude: 52, readings: given });
        const readDays = seasonDays(series).filter((d) => d.source === 'reading');
        return series.readingCount === offsets.length && readDays.every((d) => d.tmin === t && d.tmax === t + 5 && offsets.includes(daysBetween(start, d.date)));
      }),
      { numRuns: 50 },
    );
  });
});

describe('bad input', () => {
  it('rejects a reading whose minimum is above its maximum, naming the row', () => {
    const bad = [{ date: '2025-05-01', tmin: 10, tmax: 20 }, { date: '2025-05-02', tmin: 25, tmax: 20 }];
    let caught: unknown = null;
    try {
      projectSeason({ season: 2025, latitude: 52, readings: bad });
    } catch (err) {
      caught = err;
    }
    expect(caught).toBeInstanceOf(CareInputError);
    expect((caught as CareInputError).path).toBe('readings.1.tmin');
  });

  it('rejects a reading that is not a finite number', () => {
    expect(() => projectSeason({ season: 2025, latitude: 52, readings: [{ date: '2025-01-01', tmin: 1, tmax: Number.POSITIVE_INFINITY }] })).toThrow(CareInputError);
    expect(() => projectSeason({ season: 2025, latitude: 52, readings: [{ date: '2025-01-01', tmin: Number.NaN, tmax: 3 }] })).toThrow(CareInputError);
  });

  it('rejects a reading with a date that is not a date', () => {
    expect(() => projectSeason({ season: 2025, latitude: 52, readings: [{ date: 'yesterday', tmin: 1, tmax: 2 }] })).toThrow(/YYYY-MM-DD/);
    expect(() => projectSeason({ season: 2025, latitude: 52, readings: [{ date: '2025-02-30', tmin: 1, tmax: 2 }] })).toThrow(/YYYY-MM-DD/);
  });

  it('rejects normals that miss or repeat a month', () => {
    expect(() => projectSeason({ season: 2025, latitude: 52, normals: SITE_NORMALS.slice(0, 11) })).toThrow(/twelve months/);
    const repeated = SITE_NORMALS.map((n) => (n.month === 12 ? { ...n, month: 11 } : n));
    expect(() => projectSeason({ season: 2025, latitude: 52, normals: repeated })).toThrow(/appears twice/);
  });

  it('rejects a season that is not a year', () => {
    expect(() => projectSeason({ season: 25.5, latitude: 52 })).toThrow(CareInputError);
  });
});
