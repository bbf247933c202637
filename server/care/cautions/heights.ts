import { CareInputError } from '../errors';
import type { HeightBand } from './types';

// Height bands, safety.md §7 (a design choice there, label c): G feet on the ground, L feet up to
// 1.0 m, M up to 3.0 m, H above 3.0 m (or a cut point above about 4.5 m), where work is deferred.
export const LOW_BAND_MAX_M = 1.0;
export const MID_BAND_MAX_M = 3.0;
export const HIGH_CUT_POINT_M = 4.5;
/** Reach above the feet for an average adult standing (safety.md §3.2, label c). */
export const ARM_REACH_M = 2.0;

export function heightBandFor(heightM: number): HeightBand {
  if (!Number.isFinite(heightM) || heightM < 0) throw new CareInputError('Give the height in metres, zero or more.', 'heightM');
  if (heightM === 0) return 'ground';
  if (heightM <= LOW_BAND_MAX_M) return 'low';
  return heightM <= MID_BAND_MAX_M ? 'mid' : 'high';
}

/** Band for the height of the cut or the fruit, for callers that know that rather than the feet. */
export function heightBandForWork(workHeightM: number): HeightBand {
  if (!Number.isFinite(workHeightM) || workHeightM < 0) throw new CareInputError('Give the height in metres, zero or more.', 'workHeightM');
  if (workHeightM > HIGH_CUT_POINT_M) return 'high';
  return heightBandFor(Math.max(0, workHeightM - ARM_REACH_M));
}
