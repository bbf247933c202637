// Every plant type: group, degree-day base, chilling need and task rules. The folder holds one file
// per plant group's rules; this file is what `care/catalogue` means to the rest of the code.
export { taskCodes, taskLabels, type TaskCode } from './tasks';
export type {
  AfterOpens, AgeCondition, CalendarBound, ChillMeasure, ChillNeed, CloseBound, DegreeDayTrigger,
  FormCondition, MonthDay, OpenBound, PlantTypeProfile, TaskRule,
} from './types';
export { formMatches, freeStandingForms, trainedForms } from './forms';
export { degreeDayTriggers } from './triggers';
export { catalogue, catalogueBases, profileOf } from './profiles';
