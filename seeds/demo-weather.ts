import type { Sequelize } from 'sequelize';
import { dateRange, type MonthlyNormal } from '../server/care';
import { Group, Site, SiteNormal, SiteReading } from '../server/models';
import { fakeStations } from '../scripts/lib/station-fake';
import { inventedDays } from '../scripts/lib/invented-weather';
import { demoGroup, demoSites } from './demo-scenario';

// Invented weather for the demo sites (see README.md): daily readings from 1 January 2025 to the
// day before the demo is loaded, so the demo looks current whenever it starts, and monthly normals. The readings come from the same generator the
// local station fake serves for each site's station, so "Fetch missing days" carries on seamlessly.

export const DEMO_FIRST_DAY = '2025-01-01';
/** Yesterday in UTC at the moment of seeding: today's readings are not in yet. */
export const demoLastDay = (now = new Date()) => new Date(now.getTime() - 86_400_000).toISOString().slice(0, 10);

interface DemoWeather { stationId: string; source: 'upload' | 'station'; gap?: { from: string; to: string } }

const demoWeather: Record<string, DemoWeather> = {
  walled: { stationId: 'HV-1024', source: 'upload' },
  // A logger outage in August 2026 leaves four missing days for the site page to mark.
  plot: { stationId: 'SL-2051', source: 'station', gap: { from: '2026-08-11', to: '2026-08-14' } },
};

/** Monthly means of thirty invented years at the station: normals consistent with the record. */
export function demoNormals(stationId: string): MonthlyNormal[] {
  const station = fakeStations[stationId]!;
  const sums = Array.from({ length: 12 }, () => ({ tmin: 0, tmax: 0, n: 0 }));
  for (const day of inventedDays(`station:${stationId}`, '1995-01-01', '2024-12-31', station)) {
    const m = sums[Number(day.date.slice(5, 7)) - 1]!;
    m.tmin += day.tmin;
    m.tmax += day.tmax;
    m.n += 1;
  }
  return sums.map((m, i) => ({ month: i + 1, tmin: Math.round((m.tmin / m.n) * 10) / 10, tmax: Math.round((m.tmax / m.n) * 10) / 10 }));
}

function demoReadings(siteId: string, weather: DemoWeather) {
  const station = fakeStations[weather.stationId]!;
  const gap = weather.gap ? new Set(dateRange(weather.gap.from, weather.gap.to)) : new Set<string>();
  return inventedDays(`station:${weather.stationId}`, DEMO_FIRST_DAY, demoLastDay(), station)
    .filter((d) => !gap.has(d.date))
    .map((d) => ({ siteId, date: d.date, tminC: d.tmin, tmaxC: d.tmax, rainMm: d.rain, source: weather.source }));
}

/**
 * Gives each demo site its invented weather when it has none yet: safe to run on every start, and
 * it also fills a demo database that was loaded before readings existed.
 */
export async function seedDemoWeather(sequelize: Sequelize): Promise<number> {
  const group = await Group.findOne({ where: { name: demoGroup.name } });
  if (!group) return 0;
  let seeded = 0;
  for (const { key, name } of demoSites) {
    const weather = demoWeather[key];
    const site = await Site.findOne({ where: { groupId: group.id, name } });
    if (!weather || !site || (await SiteReading.count({ where: { siteId: site.id } })) > 0) continue;
    await sequelize.transaction(async (transaction) => {
      await SiteReading.bulkCreate(demoReadings(site.id, weather), { transaction });
      if ((await SiteNormal.count({ where: { siteId: site.id }, transaction })) === 0) {
        const rows = demoNormals(weather.stationId).map((n) => ({ siteId: site.id, month: n.month, tminC: n.tmin, tmaxC: n.tmax, source: 'manual' as const }));
        await SiteNormal.bulkCreate(rows, { transaction });
      }
      if (!site.stationId) await site.update({ stationId: weather.stationId }, { transaction });
    });
    seeded += 1;
  }
  return seeded;
}
