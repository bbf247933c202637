// Degree-days from daily extremes: the per-day methods, series and running totals, unit
// conversions and the Winkler index. This file is what `care/degree-days` means to the rest of the
// code. CareInputError lives in errors.ts; it is named here too because many importers take it
// from `care/degree-days`.
export type { Cutoff, DailyTemperature, DegreeDayMethod, DegreeDayOptions, TemperatureUnit } from './types';
export { CareInputError } from '../errors';
export { degreeDaysForDay } from './day-methods';
export { accumulate, accumulateExtremes, degreeDaySeries } from './series';
export { celsiusToFahrenheit, degreeDaysToCelsius, degreeDaysToFahrenheit, fahrenheitToCelsius } from './units';
export { winklerIndex, winklerRegion, type WinklerRegion } from './winkler';
