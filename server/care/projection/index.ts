// A season's daily temperatures at a site: readings where it has them, its monthly normals (or a
// built-in temperate default) everywhere else. This file is what `care/projection` means to the
// rest of the code.
export {
  checkNormals, dailyNormals, defaultNormals, TEMPERATE_DEFAULT_LABEL, TEMPERATE_DEFAULT_NORMALS, TEMPERATE_DEFAULT_SOURCE,
  type MonthlyNormal,
} from './normals';
export { seasonEnd, seasonStart } from './season-dates';
export {
  projectSeason, projectSeasonDays, seasonDateList, seasonDays,
  type DaySource, type NormalsOrigin, type ProjectionInput, type SeasonDay, type SeasonTemperatures,
} from './project';
