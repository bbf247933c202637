import { addDays, todayIn } from '../care';
import { config } from '../config';
import { sequelize } from '../db';
import { AppError } from '../lib/errors';
import { HttpStationFeed, StationUnavailableError, StationUnknownError, type StationDay, type StationFeed } from '../lib/station-feed';
import type { Site } from '../models';
import { READING_LIMIT_C, roundTemperature } from '../schemas/readings';
import type { StationPull } from '../schemas/weather';
import { latestReadingOf, siteInGroup, storedDates, writeDays, type DayRow } from './readings.service';

/** How far back a pull looks for gaps: a year covers the season so far and last winter's chill. */
export const STATION_LOOKBACK_DAYS = 366;

export const defaultStationFeed = (): StationFeed => new HttpStationFeed(config.STATION_URL, config.STATION_TIMEOUT_MS);

export async function linkStation(groupId: string, siteId: string, stationId: string | null): Promise<{ stationId: string | null }> {
  const site = await siteInGroup(groupId, siteId);
  await site.update({ stationId });
  return { stationId: site.stationId ?? null };
}

// A station's day is only worth storing when it is whole and believable; a gap stays a gap.
function usable(d: StationDay): d is StationDay & { tminC: number; tmaxC: number } {
  return d.tminC !== null && d.tmaxC !== null && d.tminC <= d.tmaxC && Math.abs(d.tminC) <= READING_LIMIT_C && Math.abs(d.tmaxC) <= READING_LIMIT_C;
}

function missingDates(from: string, to: string, stored: Set<string>): string[] {
  const out: string[] = [];
  for (let d = from; d <= to; d = addDays(d, 1)) if (!stored.has(d)) out.push(d);
  return out;
}

/**
 * Fetches the days the site lacks, up to yesterday at the site, and stores them in one transaction.
 * Days already stored (uploaded, typed in or pulled before) are never overwritten. The fetch comes
 * first, so a service that is down leaves the table untouched.
 */
export async function pullMissingDays(site: Site, feed: StationFeed, today: string): Promise<StationPull> {
  const stationId = site.stationId;
  if (!stationId) throw new AppError('VALIDATION_FAILED', 'Link the site to a weather station first', [{ path: 'stationId', message: 'No station linked' }]);
  const to = addDays(today, -1);
  const missing = missingDates(addDays(to, 1 - STATION_LOOKBACK_DAYS), to, await storedDates(site.id, addDays(to, 1 - STATION_LOOKBACK_DAYS), to));
  const from = missing[0];
  if (!from) return { stationId, from: null, to: null, added: 0, latestReading: await latestReadingOf(site.id) };
  const wanted = new Set(missing);
  const days: DayRow[] = (await feed.fetchDays(stationId, from, to)).filter(usable).filter((d) => wanted.has(d.date))
    .map((d) => ({ date: d.date, tminC: roundTemperature(d.tminC), tmaxC: roundTemperature(d.tmaxC), rainMm: d.rainMm !== null && d.rainMm >= 0 ? d.rainMm : null }));
  return sequelize.transaction(async (transaction) => {
    const { added } = await writeDays(site.id, days, 'station', 'skip', transaction);
    return { stationId, from, to, added, latestReading: await latestReadingOf(site.id, transaction) };
  });
}

/** The "Fetch missing days" button: the service's failures become answers a grower can act on. */
export async function pullStationForSite(groupId: string, siteId: string, feed: StationFeed = defaultStationFeed()): Promise<StationPull> {
  const site = await siteInGroup(groupId, siteId);
  try {
    return await pullMissingDays(site, feed, todayIn(site.timeZone));
  } catch (err) {
    if (err instanceof StationUnavailableError) throw new AppError('UNAVAILABLE', `${err.message}. Nothing was written; try again later.`);
    if (err instanceof StationUnknownError) throw new AppError('UNPROCESSABLE', `${err.message}. Check the station id.`, [{ path: 'stationId', message: 'Unknown station' }]);
    throw err;
  }
}
