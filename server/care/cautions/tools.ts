import { heightBandFor } from './heights';
import type { CautionTask, CautionTool } from './types';

// The tools a caller did not list are assumed from the task and height, so the cautions for the
// usual kit still appear.

const GROUND_TOOLS: Record<CautionTask, CautionTool[]> = {
  prune: ['secateurs', 'loppers', 'pruning-saw', 'sanitiser'],
  thin: ['secateurs'],
  feed: ['granular-feed', 'liquid-feed'],
  spray: ['sprayer'],
  harvest: [],
  'tie-in': ['secateurs'],
  mulch: [],
  'pick-leaves': [],
  pinch: [],
};
// Done from the ground whatever the plant's height: spraying from a ladder showers the sprayer.
const GROUND_ONLY_TASKS: CautionTask[] = ['feed', 'spray', 'mulch'];

/**
 * The usual tools for a task with the feet at `heightM`: a ladder once off the ground, and no
 * loppers above the low band, because they need both hands and a ladder needs one.
 */
export function toolsFor(task: CautionTask, heightM?: number | null): CautionTool[] {
  const band = heightM == null ? 'ground' : heightBandFor(heightM);
  const tools = GROUND_TOOLS[task];
  if (band === 'ground' || GROUND_ONLY_TASKS.includes(task)) return [...tools];
  return ['ladder', ...tools.filter((tool) => band === 'low' || tool !== 'loppers')];
}
