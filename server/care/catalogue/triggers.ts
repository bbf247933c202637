import { FROM_MEMORY } from '../sources';
import type { DegreeDayTrigger } from './types';

// The degree-day triggers that rules open or close on, each resolved once per site and season.
//
// Where the reference gives only a calendar window for a growth stage (shoots stopped growing,
// June drop over, berries pea-sized) the rule uses a degree-day trigger *derived* from that date:
// the total the built-in lowland-England normals reach on it (single sine, from the season's
// start). In an average year there the window opens on the published date; a warmer year or site
// opens it earlier. These totals are ours, not published, so they carry FROM_MEMORY.

export const GREEN_TIP: DegreeDayTrigger = {
  kind: 'degree-days', id: 'apple-green-tip', degreeDays: 67, base: 6.1, from: { month: 3, day: 1 },
  earliest: { month: 3, day: 1 }, latest: { month: 4, day: 30 },
  // 120 °F·days base 43 °F from 1 March (UMass), converted: 120 / 1.8 ≈ 67 °C·days base 6.1 °C.
  source: ['S49'],
  cue: { reached: 'Apple buds have reached green tip', expected: 'Apple buds are expected to reach green tip' },
};
export const PEAR_SHOOTS_STOPPED: DegreeDayTrigger = {
  kind: 'degree-days', id: 'pear-shoots-stopped', degreeDays: 1200, base: 5, calibratedTo: { month: 7, day: 25 },
  earliest: { month: 7, day: 10 }, latest: { month: 8, day: 15 }, source: [FROM_MEMORY, 'S6'],
  cue: { reached: 'Growth has stopped on trained pears', expected: 'Growth on trained pears is expected to stop' },
};
export const APPLE_SHOOTS_STOPPED: DegreeDayTrigger = {
  kind: 'degree-days', id: 'apple-shoots-stopped', degreeDays: 1470, base: 5, calibratedTo: { month: 8, day: 15 },
  earliest: { month: 8, day: 1 }, latest: { month: 9, day: 10 }, source: [FROM_MEMORY, 'S6'],
  cue: { reached: 'Growth has stopped on trained apples', expected: 'Growth on trained apples is expected to stop' },
};
export const JUNE_DROP_OVER: DegreeDayTrigger = {
  kind: 'degree-days', id: 'june-drop-over', degreeDays: 890, base: 5, calibratedTo: { month: 7, day: 1 },
  earliest: { month: 6, day: 15 }, latest: { month: 7, day: 10 }, source: [FROM_MEMORY, 'S29'],
  cue: { reached: 'The June drop is over', expected: 'The June drop is expected to be over' },
};
export const GRAPES_PEA_SIZED: DegreeDayTrigger = {
  kind: 'degree-days', id: 'grape-pea-size', degreeDays: 460, base: 10, calibratedTo: { month: 7, day: 15 },
  earliest: { month: 6, day: 20 }, latest: { month: 7, day: 31 }, source: [FROM_MEMORY],
  cue: { reached: 'The grapes are about pea-sized', expected: 'The grapes are expected to be about pea-sized' },
};

export const degreeDayTriggers: readonly DegreeDayTrigger[] = [GREEN_TIP, PEAR_SHOOTS_STOPPED, APPLE_SHOOTS_STOPPED, JUNE_DROP_OVER, GRAPES_PEA_SIZED];
