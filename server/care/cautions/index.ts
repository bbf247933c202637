// Safety cautions picked from the reminder table in the team's safety reference (safety.md §7) by
// task, tools, height band and site hazards. Nothing here says a job is safe: cautions point at
// known hazards and, for high work or power lines, hand the job to a qualified arborist and the
// electricity network operator. This file is what `care/cautions` means to the rest of the code.
export type { Caution, CautionInput, CautionSeverity, CautionTask, CautionTool, HeightBand } from './types';
export { ARM_REACH_M, HIGH_CUT_POINT_M, LOW_BAND_MAX_M, MID_BAND_MAX_M, heightBandFor, heightBandForWork } from './heights';
export { toolsFor } from './tools';
export { heatBand, uvProtection, waterCups, type HeatBand } from './heat';
export { cautionsFor } from './select';
// The source labels belong to sources.ts; they are named here too because callers of the cautions
// compare a caution's source with them.
export { COMMON_PRACTICE, FROM_MEMORY } from '../sources';
