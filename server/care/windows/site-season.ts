import { daysBetween, type IsoDate } from '../dates';
import { accumulateExtremes, type DailyTemperature } from '../degree-days';
import { projectSeason, type MonthlyNormal } from '../projection';
import { calendarMap } from './prepared-lists';
import { windowDegreeDayMethod } from './triggers';
import type { SiteInput, SiteSeason } from './types';

// A site's season: the projection, and the caches that every plant at the site shares.

/**
 * Everything about a site's season that does not depend on the plant. The projection is made here;
 * each base's degree-days are accumulated, and its triggers resolved, once, when a plant first needs
 * one of them (a site without apples or vines never pays for their triggers).
 */
export function siteSeason(site: SiteInput, season: number, readings?: readonly DailyTemperature[], normals?: readonly MonthlyNormal[]): SiteSeason {
  const temperatures = projectSeason({ season, latitude: site.latitude, ...(readings ? { readings } : {}), ...(normals ? { normals } : {}) });
  const { hemisphere } = temperatures;
  return { season, hemisphere, temperatures, cumulative: new Map(), triggers: new Map(), siteWindows: new Map(), calendar: calendarMap(season, hemisphere) };
}

/** Running degree-day totals from the season's start at a base (°C), on the windows' method. */
export function cumulativeDegreeDays(ss: SiteSeason, base: number): Float64Array {
  let cum = ss.cumulative.get(base);
  if (!cum) {
    cum = accumulateExtremes(ss.temperatures.tmin, ss.temperatures.tmax, { ...windowDegreeDayMethod, lower: base });
    ss.cumulative.set(base, cum);
  }
  return cum;
}

/** Degree-days at a site from `since` to `through` (both included), on the windows' method. */
export function degreeDaysBetween(ss: SiteSeason, base: number, since: IsoDate, through: IsoDate): number {
  const cum = cumulativeDegreeDays(ss, base);
  const start = ss.temperatures.start;
  const a = Math.max(0, daysBetween(start, since));
  const b = Math.min(cum.length - 1, daysBetween(start, through));
  if (b < a) return 0;
  return (cum[b] as number) - (a > 0 ? (cum[a - 1] as number) : 0);
}
