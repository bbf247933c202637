import { Op, type Sequelize } from 'sequelize';
import { todayIn } from '../../server/care';
import type { StationFeed } from '../../server/lib/station-feed';
import { Site } from '../../server/models';
import { defaultStationFeed, pullMissingDays } from '../../server/services/station.service';

export interface PullStationReadingsDeps {
  /** The models are bound to the process's connection; `db` is taken for the same shape as the other jobs. */
  db: Sequelize;
  now?: () => Date;
  feed?: StationFeed;
  log?: (msg: string, extra?: object) => void;
}

/**
 * Once a day: every live site linked to a station gets the days it lacks, up to yesterday at the
 * site. One site's failure (service down, unknown station) is logged and the others carry on; a
 * failed site has nothing written, and the next run simply tries again.
 */
export async function run({ now = () => new Date(), feed = defaultStationFeed(), log = () => {} }: PullStationReadingsDeps) {
  const sites = await Site.findAll({ where: { stationId: { [Op.ne]: null }, archivedAt: null }, order: [['id', 'ASC']] });
  let added = 0;
  let failed = 0;
  for (const site of sites) {
    try {
      added += (await pullMissingDays(site, feed, todayIn(site.timeZone, now()))).added;
    } catch (err) {
      failed += 1;
      log('station pull failed', { siteId: site.id, stationId: site.stationId, error: err instanceof Error ? err.message : String(err) });
    }
  }
  return { sites: sites.length, added, failed };
}
