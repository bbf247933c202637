// A plant's care windows for one season, and their state on a given day.
//
// The engine never reads the clock: callers pass `on`. seasonWindows() defaults it to the first day
// of the season (1 January in the north, 1 July in the south), so a call without it is repeatable.
//
// A season is a calendar year in the north and 1 July – 30 June in the south; every calendar bound
// moves six months on for a southern site and degree-days count from 1 July there. Dormant-season
// work belongs to the season whose growth it prepares, so a season's winter pruning opens the
// previous November (the previous May in the south): ask for season + 1 to see next winter's.
//
// For speed, the per-site work is done once per site and season: siteSeason() makes the projection,
// and the first plant that needs a degree-day trigger has its base accumulated and all of that
// base's triggers resolved, kept in the SiteSeason. Windows that do not depend on the site are
// prepared once per season and hemisphere for the whole process. windowsForPlant() then only picks
// the rules that fit a plant and stamps each window's state.
//
// This file is what `care/windows` means to the rest of the code; each step has a file of its own:
// site-season, triggers, rule-window (one rule's window), prepared-lists (a type's windows at a
// site), plant-windows (a plant's windows and their state).
export type {
  CareWindow, PlantInput, PreparedWindow, SiteInput, SiteSeason, TriggerOutcome, Window, WindowBasis, WindowState,
} from './types';
export { calendarDate, formatDay } from './calendar';
export { windowState } from './state';
export { triggerOutcome, windowDegreeDayMethod } from './triggers';
export { cumulativeDegreeDays, degreeDaysBetween, siteSeason } from './site-season';
export { seasonWindows, windowsForPlant, type SeasonWindowsInput } from './plant-windows';
