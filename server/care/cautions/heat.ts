import { CareInputError } from '../errors';

// Heat, sun and water on a working day, from the OSHA and WHO guidance the cautions cite.

/** OSHA heat-index bands (°F): lower < 91 ≤ moderate ≤ 103 < high ≤ 115 < very high. */
export type HeatBand = 'lower' | 'moderate' | 'high' | 'very high';
export const HEAT_BANDS: HeatBand[] = ['lower', 'moderate', 'high', 'very high'];

function bandOfHeatIndex(heatIndexF: number): HeatBand {
  if (heatIndexF < 91) return 'lower';
  if (heatIndexF <= 103) return 'moderate';
  return heatIndexF <= 115 ? 'high' : 'very high';
}

/**
 * OSHA heat band. Full sun can add up to 15 °F, and OSHA says to take the next band's measures
 * when working in direct sun near a boundary: so full sun moves up at most one band, and only
 * when the extra 15 °F would cross into it.
 */
export function heatBand(heatIndexF: number, isFullSun = false): HeatBand {
  if (!Number.isFinite(heatIndexF)) throw new CareInputError('The heat index must be a number.', 'heatIndexF');
  const shade = HEAT_BANDS.indexOf(bandOfHeatIndex(heatIndexF));
  if (!isFullSun) return HEAT_BANDS[shade] as HeatBand;
  const sun = HEAT_BANDS.indexOf(bandOfHeatIndex(heatIndexF + 15));
  return HEAT_BANDS[Math.min(sun, shade + 1)] as HeatBand;
}

/** WHO Global Solar UV Index guide: protect from 3, take extra care from 8. */
export function uvProtection(uvIndex: number): { isNeeded: boolean; isVeryHigh: boolean } {
  return { isNeeded: uvIndex >= 3, isVeryHigh: uvIndex >= 8 };
}

/** OSHA: about a cup (240 ml) every 15–20 minutes in the heat. */
export function waterCups(minutes: number): { min: number; max: number } {
  return { min: Math.floor(minutes / 20), max: Math.ceil(minutes / 15) };
}
