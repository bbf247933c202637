import { fn, col } from 'sequelize';
import { hemisphereOf } from '../care/dates';
import { conflict, notFound } from '../lib/errors';
import { Plant, Site } from '../models';
import type { Site as SiteDto, SiteCreate, SiteUpdate } from '../schemas/site';

type SiteInput = Partial<Omit<SiteCreate, 'hazards' | 'notes'>> & { hazards?: SiteDto['hazards']; notes?: string };

function toSite(site: Site, plantCount: number): SiteDto {
  return {
    id: site.id,
    groupId: site.groupId,
    name: site.name,
    latitude: site.latitude,
    longitude: site.longitude,
    elevationM: site.elevationM,
    timeZone: site.timeZone,
    hemisphere: hemisphereOf(site.latitude),
    hazards: site.hazards,
    notes: site.notes,
    plantCount,
    archivedAt: site.archivedAt?.toISOString() ?? null,
    createdAt: site.createdAt.toISOString(),
    updatedAt: site.updatedAt.toISOString(),
  };
}

// Only these fields may come from a request; anything else in the body never reaches the table.
function pickSiteFields(input: SiteInput) {
  const { name, latitude, longitude, elevationM, timeZone, hazards, notes } = input;
  return Object.fromEntries(Object.entries({ name, latitude, longitude, elevationM, timeZone, hazards, notes }).filter(([, v]) => v !== undefined));
}

async function plantCounts(groupId: string): Promise<Map<string, number>> {
  const rows = (await Plant.findAll({
    attributes: ['siteId', [fn('COUNT', col('id')), 'count']],
    where: { groupId, archivedAt: null },
    group: ['siteId'],
    raw: true,
  })) as unknown as { siteId: string; count: string }[];
  return new Map(rows.map((r) => [r.siteId, Number(r.count)]));
}

async function findSite(groupId: string, siteId: string): Promise<Site> {
  const site = await Site.findOne({ where: { id: siteId, groupId } });
  if (!site) throw notFound('Site');
  return site;
}

export async function listSites(groupId: string, includeArchived: boolean): Promise<SiteDto[]> {
  const sites = await Site.findAll({ where: { groupId, ...(includeArchived ? {} : { archivedAt: null }) }, order: [['name', 'ASC']] });
  const counts = await plantCounts(groupId);
  return sites.map((s) => toSite(s, counts.get(s.id) ?? 0));
}

export async function getSite(groupId: string, siteId: string): Promise<SiteDto> {
  const site = await findSite(groupId, siteId);
  return toSite(site, (await plantCounts(groupId)).get(siteId) ?? 0);
}

export async function createSite(groupId: string, input: SiteInput): Promise<SiteDto> {
  const site = await Site.create({ hazards: [], notes: '', elevationM: null, archivedAt: null, ...pickSiteFields(input), groupId } as unknown as Site);
  return toSite(site, 0);
}

export async function updateSite(groupId: string, siteId: string, input: SiteInput): Promise<SiteDto> {
  const site = await findSite(groupId, siteId);
  await site.update(pickSiteFields(input));
  return getSite(groupId, siteId);
}

export async function setSiteArchived(groupId: string, siteId: string, archived: boolean): Promise<SiteDto> {
  const site = await findSite(groupId, siteId);
  await site.update({ archivedAt: archived ? new Date() : null });
  return getSite(groupId, siteId);
}

export async function deleteSite(groupId: string, siteId: string): Promise<void> {
  const site = await findSite(groupId, siteId);
  const plants = await Plant.count({ where: { siteId } });
  if (plants > 0) throw conflict(`This site still has ${plants} plant${plants === 1 ? '' : 's'}; move or delete them first`);
  await site.destroy();
}
