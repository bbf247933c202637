import { monthOf, type Hemisphere, type IsoDate } from '../dates';
import { CareInputError } from '../errors';
import { averageMethod, checkDay } from './day-methods';
import type { DailyTemperature, TemperatureUnit } from './types';

// The Winkler index of a vineyard site and the region it falls in, with the published bands.

function inWinklerSeason(date: IsoDate, hemisphere: Hemisphere): boolean {
  const month = monthOf(date);
  return hemisphere === 'north' ? month >= 4 && month <= 10 : month >= 10 || month <= 4;
}

/**
 * Winkler index in °C·days: 1 April–31 October in the north, 1 October–30 April in the south,
 * average method, base 10 °C, no upper threshold. Summed from daily values (Amerine & Winkler
 * worked from monthly means, which come out slightly lower). Pass one season's days.
 */
export function winklerIndex(days: DailyTemperature[], hemisphere: Hemisphere): number {
  let total = 0;
  days.forEach((day, i) => {
    checkDay(day.tmin, day.tmax, i);
    if (inWinklerSeason(day.date, hemisphere)) total += averageMethod(day.tmin, day.tmax, 10, Number.POSITIVE_INFINITY);
  });
  return total;
}

export type WinklerRegion = 'too cool' | 'Ia' | 'Ib' | 'II' | 'III' | 'IV' | 'V' | 'too hot';

const WINKLER_SOURCE_ORIGINAL = 'Amerine & Winkler 1944, Hilgardia 15:493–673';
const WINKLER_SOURCE_JONES = 'Jones et al. 2010, Am. J. Enol. Vitic. 61:313–326 (refining Amerine & Winkler 1944)';

// Upper bounds in °F·days as published; the band includes its upper bound (≤ / >) because the
// published integer ranges leave gaps such as 2500–2501.
const WINKLER_BANDS: { region: WinklerRegion; upperF: number; source: string }[] = [
  { region: 'too cool', upperF: 1500, source: WINKLER_SOURCE_JONES },
  { region: 'Ia', upperF: 2000, source: WINKLER_SOURCE_JONES },
  { region: 'Ib', upperF: 2500, source: WINKLER_SOURCE_JONES },
  { region: 'II', upperF: 3000, source: WINKLER_SOURCE_ORIGINAL },
  { region: 'III', upperF: 3500, source: WINKLER_SOURCE_ORIGINAL },
  { region: 'IV', upperF: 4000, source: WINKLER_SOURCE_ORIGINAL },
  { region: 'V', upperF: 4900, source: WINKLER_SOURCE_JONES },
];

function formatC(f: number): string {
  return String(Math.round(f / 1.8));
}

function winklerLabel(region: WinklerRegion, lowerF: number | null, upperF: number | null): string {
  if (region === 'too cool') return `Cooler than Region Ia (under ${formatC(1500)} °C·days)`;
  if (region === 'too hot') return `Hotter than Region V (over ${formatC(4900)} °C·days)`;
  return `Region ${region} (${formatC(lowerF ?? 0)}–${formatC(upperF ?? 0)} °C·days)`;
}

/**
 * Winkler region for an index. Compared in °C against the exact conversions of the published °F
 * bounds, so a value converted from a boundary lands in the band the °F table puts it in.
 * "too cool" is strictly below 1500 °F·days (Ia starts at 1500 inclusive).
 */
export function winklerRegion(index: number, unit: TemperatureUnit = 'C'): { region: WinklerRegion; label: string; source: string } {
  if (!Number.isFinite(index)) throw new CareInputError('The Winkler index must be a number.', 'index');
  const indexC = unit === 'C' ? index : index / 1.8;
  let lowerF: number | null = null;
  for (const band of WINKLER_BANDS) {
    const upperC = band.upperF / 1.8;
    const isInside = band.region === 'too cool' ? indexC < upperC : indexC <= upperC;
    if (isInside) return { region: band.region, label: winklerLabel(band.region, lowerF, band.upperF), source: band.source };
    lowerF = band.upperF;
  }
  return { region: 'too hot', label: winklerLabel('too hot', null, null), source: WINKLER_SOURCE_JONES };
}
