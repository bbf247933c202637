import { describe, expect, it } from 'vitest';
import { chillHours, hourlyTemperatures, seasonChill, solarDayHours, utahChillUnits, utahWeight } from '../../server/care/chill';
import { dateRange } from '../../server/care/dates';
import { CareInputError, type DailyTemperature } from '../../server/care/degree-days';

// The 24-hour example day of degree-days.md §4.2 [computed], hours 0–23 in °C.
const EXAMPLE_DAY = [8, 7, 6, 5, 4, 3.5, 3, 2, 1, 0.5, 1.5, 4, 7, 10, 13, 15, 17, 18.5, 19, 17.5, 15, 12, 10, 9];

describe('solarDayHours (Spencer 1971 declination, −0.8333°, as in chillR daylength)', () => {
  it('gives sunrise 7.766425, sunset 16.23357, day length 8.467149 h at 50.4° on day 15', () => {
    // Luedeling, chillR vignette "Producing hourly temperature records for agroclimatic analysis"
    const sun = solarDayHours(50.4, 15);
    expect(sun.sunrise).toBeCloseTo(7.766425, 5);
    expect(sun.sunset).toBeCloseTo(16.23357, 5);
    expect(sun.dayLength).toBeCloseTo(8.467149, 5);
  });

  it('gives 7.962814 / 16.03719 / 8.074373 h at 50.5° on day 1', () => {
    // Luedeling, chillR vignette "Producing hourly temperature records for agroclimatic analysis"
    const sun = solarDayHours(50.5, 1);
    expect(sun.sunrise).toBeCloseTo(7.962814, 5);
    expect(sun.sunset).toBeCloseTo(16.03719, 5);
    expect(sun.dayLength).toBeCloseTo(8.074373, 5);
  });

  it('reports polar night and polar day', () => {
    expect(solarDayHours(80, 355).dayLength).toBe(0);
    expect(solarDayHours(80, 172).dayLength).toBe(24);
    expect(solarDayHours(-80, 172).dayLength).toBe(0);
  });
});

describe('hourlyTemperatures (Linvill 1990 as implemented in chillR make_hourly_temps)', () => {
  const days: DailyTemperature[] = [
    { date: '1998-01-01', tmin: 5.1, tmax: 8.2 },
    { date: '1998-01-02', tmin: 5.0, tmax: 9.1 },
    { date: '1998-01-03', tmin: 4.0, tmax: 9.0 },
  ];

  it('reproduces the chillR vignette night from 1 Jan 19 h to 2 Jan 5 h at 50.4°', () => {
    // Luedeling, chillR vignette "Producing hourly temperature records for agroclimatic analysis", KA_weather 1998
    const hourly = hourlyTemperatures(days, 50.4);
    const expected = [6.424223, 6.203183, 6.022917, 5.870701, 5.738969, 5.574983, 5.468975, 5.373123, 5.28565, 5.205208, 5.13075];
    hourly.slice(19, 30).forEach((h, i) => expect(h.temp).toBeCloseTo(expected[i] as number, 5));
    expect(hourly[24]).toMatchObject({ date: '1998-01-02', hour: 0 });
  });

  it('gives 24 hours a day that rise from the minimum to the maximum two hours after noon', () => {
    const hourly = hourlyTemperatures(days, 50.4);
    expect(hourly).toHaveLength(72);
    const day2 = hourly.filter((h) => h.date === '1998-01-02').map((h) => h.temp);
    const peakHour = day2.indexOf(Math.max(...day2));
    expect(peakHour).toBe(14);
    expect(Math.max(...day2)).toBeLessThanOrEqual(9.1);
    expect(Math.max(...day2)).toBeGreaterThan(9.0);
  });

  it('stays flat when every extreme is the same', () => {
    const flat = dateRange('2026-01-01', '2026-01-03').map((date) => ({ date, tmin: 4, tmax: 4 }));
    for (const h of hourlyTemperatures(flat, 52)) expect(h.temp).toBeCloseTo(4, 12);
  });

  it('uses the mean of the extremes every hour in polar night', () => {
    const hourly = hourlyTemperatures([{ date: '2026-12-21', tmin: -12, tmax: -4 }], 78);
    expect(new Set(hourly.map((h) => h.temp))).toEqual(new Set([-8]));
  });

  it('rejects a minimum above the maximum and a bad latitude', () => {
    expect(() => hourlyTemperatures([{ date: '2026-01-01', tmin: 5, tmax: 1 }], 50)).toThrow(CareInputError);
    expect(() => seasonChill([], 95)).toThrow(CareInputError);
  });
});

describe('chillHours (0 ≤ T ≤ 7.2 °C, chillR Chilling_Hours after Weinberger 1950 and Bennett 1949)', () => {
  it('includes both boundaries', () => {
    expect(chillHours([-0.01, 0, 3, 7.2, 7.21])).toBe(3);
  });

  it('counts 5 hours in the boundary probe and 12 in the example day', () => {
    // degree-days.md §4.2 worked Utah example [computed]
    expect(chillHours([-1, 1.4, 1.5, 2.4, 2.5, 6.0, 9.1, 9.2, 12.4, 12.5, 15.9, 16.0, 18.0, 18.1, 25.0])).toBe(5);
    expect(chillHours(EXAMPLE_DAY)).toBe(12);
  });
});

describe('Utah chill units (Richardson, Seeley & Walker 1974, HortScience 9, with chillR bands)', () => {
  it('weights the band boundaries as chillR does', () => {
    // Richardson et al. 1974 via chillR Utah_Model; degree-days.md §7 row 21
    const probes = [1.4, 1.5, 2.4, 2.5, 9.1, 9.2, 12.4, 12.5, 15.9, 16.0, 18.0, 18.1];
    expect(probes.map(utahWeight)).toEqual([0, 0.5, 0.5, 1, 1, 0.5, 0.5, 0, 0, -0.5, -0.5, -1]);
  });

  it('sums the boundary probe to +2.0', () => {
    // degree-days.md §4.2 worked Utah example [computed]
    expect(utahChillUnits([-1, 1.4, 1.5, 2.4, 2.5, 6.0, 9.1, 9.2, 12.4, 12.5, 15.9, 16.0, 18.0, 18.1, 25.0])).toBe(2);
  });

  it('gives +9.5 for the example day and +95 over ten of them', () => {
    // degree-days.md §4.2 realistic 24-hour day [computed]; §7 row 22
    expect(utahChillUnits(EXAMPLE_DAY)).toBe(9.5);
    const tenDays = Array.from({ length: 10 }, () => EXAMPLE_DAY).flat();
    expect(utahChillUnits(tenDays)).toBe(95);
    expect(chillHours(tenDays)).toBe(120);
  });

  it('keeps negative hours in the sum, with no floor', () => {
    expect(utahChillUnits([20, 20, 5])).toBe(-1);
  });
});

describe('seasonChill', () => {
  it('adds up chill over a run of days from the estimated hours', () => {
    // Steady 2/6 °C days at 50° N: every hour lies inside 0–7.2 °C, so every hour is a chill hour,
    // and every hour lies in the Utah 2.4–9.1 band apart from the coolest hours near 2 °C.
    const days = dateRange('2026-01-01', '2026-01-10').map((date) => ({ date, tmin: 2, tmax: 6 }));
    const chill = seasonChill(days, 50);
    expect(chill.chillHours).toBe(240);
    const hourly = hourlyTemperatures(days, 50).map((h) => h.temp);
    expect(chill.utahUnits).toBe(utahChillUnits(hourly));
    expect(chill.utahUnits).toBeGreaterThan(200);
    expect(chill.utahUnits).toBeLessThanOrEqual(240);
  });

  it('loses a Utah unit every hour of a spell above 18 °C', () => {
    const days = dateRange('2026-07-01', '2026-07-05').map((date) => ({ date, tmin: 19, tmax: 28 }));
    expect(seasonChill(days, 45)).toEqual({ chillHours: 0, utahUnits: -120 });
  });
});
