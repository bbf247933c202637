import { dayOfYear, type IsoDate } from './dates';
import type { DailyTemperature } from './degree-days';
import { CareInputError } from './errors';

// Winter chill from daily extremes (°C only: the chill thresholds are fixed in °C).
//
// Hourly temperatures follow Linvill (1990) as implemented in the R package chillR
// (make_hourly_temps): a sine rise from sunrise to a peak two hours after solar noon, then a
// logarithmic fall through the night to the next minimum. Sunrise and sunset come from Spencer's
// (1971) declination with the −0.8333° rise/set altitude, in local solar time (noon = 12), as chillR
// does, rather than from suncalc: it needs only latitude, costs a few multiplications a day, and
// reproduces chillR's published vignette values exactly. suncalc's day length differs by up to
// about 0.06 h, which moves hourly temperatures by under 0.05 °C. We keep chillR's two small quirks
// (the morning branch uses today's day length in yesterday's sunset temperature, and its log
// denominator lacks "+1") so results match chillR to 1e-6.

export interface SunHours {
  sunrise: number;
  sunset: number;
  dayLength: number;
}

const RISE_SET_ALTITUDE_RAD = (-0.8333 * Math.PI) / 180;

/** Sunrise, sunset and day length in hours of local solar time (chillR `daylength`). */
export function solarDayHours(latitude: number, julianDay: number): SunHours {
  const g = (2 * Math.PI * (julianDay - 1)) / 365;
  const declination =
    0.006918 - 0.399912 * Math.cos(g) + 0.070257 * Math.sin(g) - 0.006758 * Math.cos(2 * g) +
    0.000907 * Math.sin(2 * g) - 0.002697 * Math.cos(3 * g) + 0.00148 * Math.sin(3 * g);
  const phi = (latitude * Math.PI) / 180;
  const cosOmega = (Math.sin(RISE_SET_ALTITUDE_RAD) - Math.sin(phi) * Math.sin(declination)) / (Math.cos(phi) * Math.cos(declination));
  if (cosOmega >= 1) return { sunrise: 12, sunset: 12, dayLength: 0 };
  if (cosOmega <= -1) return { sunrise: 0, sunset: 24, dayLength: 24 };
  const halfDayHours = (Math.acos(cosOmega) * 180) / Math.PI / 15;
  return { sunrise: 12 - halfDayHours, sunset: 12 + halfDayHours, dayLength: 2 * halfDayHours };
}

function checkInputs(days: DailyTemperature[], latitude: number): void {
  if (!Number.isFinite(latitude) || latitude < -90 || latitude > 90) throw new CareInputError('Latitude runs from -90 to 90.', 'latitude');
  days.forEach((day, i) => {
    if (!Number.isFinite(day.tmin) || !Number.isFinite(day.tmax)) throw new CareInputError('Temperatures must be numbers.', `days.${i}.tmin`);
    if (day.tmin > day.tmax) throw new CareInputError(`The minimum temperature (${day.tmin}) is above the maximum (${day.tmax}).`, `days.${i}.tmin`);
  });
}

function sunsetTemperature(tmin: number, tmax: number, dayLength: number): number {
  return tmin + (tmax - tmin) * Math.sin((Math.PI * dayLength) / (dayLength + 4));
}

/**
 * 24 hourly temperatures per day into one flat array. The first day stands in for its own
 * previous day and the last day for its own next day, since the series gives nothing beyond them.
 */
function hourlyArray(days: DailyTemperature[], latitude: number): Float64Array {
  checkInputs(days, latitude);
  const n = days.length;
  const sun = days.map((day) => solarDayHours(latitude, dayOfYear(day.date)));
  const out = new Float64Array(n * 24);
  for (let d = 0; d < n; d++) {
    const today = days[d] as DailyTemperature;
    const prev = days[d - 1] ?? today;
    const next = days[d + 1] ?? today;
    const s = sun[d] as SunHours;
    const sPrev = sun[d - 1] ?? s;
    const sNext = sun[d + 1] ?? s;
    const { tmin, tmax } = today;
    if (s.dayLength === 0 || s.dayLength === 24) {
      out.fill((tmin + tmax) / 2, d * 24, d * 24 + 24); // chillR's rule for polar day and night
      continue;
    }
    const tSunset = sunsetTemperature(tmin, tmax, s.dayLength);
    const tPrevSunset = sunsetTemperature(prev.tmin, prev.tmax, s.dayLength);
    const eveningSpan = Math.log(24 - (s.sunset - sNext.sunrise) + 1);
    const morningSpan = Math.log(Math.max(1, 24 - (sPrev.sunset - s.sunrise)));
    for (let h = 0; h < 24; h++) {
      let t: number;
      if (h <= s.sunrise) t = tPrevSunset - ((tPrevSunset - tmin) / morningSpan) * Math.log(h + 24 - sPrev.sunset + 1);
      else if (h < s.sunset) t = tmin + (tmax - tmin) * Math.sin((Math.PI * (h - s.sunrise)) / (s.dayLength + 4));
      else t = tSunset - ((tSunset - next.tmin) / eveningSpan) * Math.log(h - s.sunset + 1);
      out[d * 24 + h] = t;
    }
  }
  return out;
}

/** Estimated temperature for every hour (0–23, local solar time) of every day given, in °C. */
export function hourlyTemperatures(days: DailyTemperature[], latitude: number): { date: IsoDate; hour: number; temp: number }[] {
  const temps = hourlyArray(days, latitude);
  return Array.from(temps, (temp, i) => ({ date: (days[Math.floor(i / 24)] as DailyTemperature).date, hour: i % 24, temp }));
}

/** Chill hours: hours with 0 ≤ T ≤ 7.2 °C, both bounds included (chillR Chilling_Hours; Weinberger 1950, Bennett 1949). */
export function chillHours(hourly: ArrayLike<number>): number {
  let count = 0;
  for (let i = 0; i < hourly.length; i++) {
    const t = hourly[i] as number;
    if (t >= 0 && t <= 7.2) count++;
  }
  return count;
}

/**
 * Utah chill-unit weight for one hour (Richardson, Seeley & Walker 1974), with chillR's bands:
 * lower bound excluded, upper bound included.
 */
export function utahWeight(t: number): number {
  if (t <= 1.4) return 0;
  if (t <= 2.4) return 0.5;
  if (t <= 9.1) return 1;
  if (t <= 12.4) return 0.5;
  if (t <= 15.9) return 0;
  if (t <= 18) return -0.5;
  return -1;
}

/** Utah chill units: the plain sum of hourly weights, negatives included and no floor, as chillR sums them. */
export function utahChillUnits(hourly: ArrayLike<number>): number {
  let total = 0;
  for (let i = 0; i < hourly.length; i++) total += utahWeight(hourly[i] as number);
  return total;
}

/** Chill hours and Utah units over a run of days, from hourly temperatures estimated as above. */
export function seasonChill(days: DailyTemperature[], latitude: number): { chillHours: number; utahUnits: number } {
  const hourly = hourlyArray(days, latitude);
  return { chillHours: chillHours(hourly), utahUnits: utahChillUnits(hourly) };
}
