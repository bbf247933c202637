import { Op, type Order, type OrderItem, type WhereOptions } from 'sequelize';
import { notFound, validationFailed } from '../lib/errors';
import { Photo, Plant, Site } from '../models';
import { removePhotoFiles } from './photo.service';
import type { Plant as PlantDto, PlantCreate, PlantList, plantListQuerySchema } from '../schemas/plant';
import type { z } from 'zod';

type PlantListQuery = z.output<typeof plantListQuerySchema>;
type PlantInput = Partial<PlantCreate>;

export function toPlant(plant: Plant): PlantDto {
  return {
    id: plant.id,
    groupId: plant.groupId,
    siteId: plant.siteId,
    siteName: plant.site?.name ?? '',
    typeCode: plant.typeCode,
    cultivar: plant.cultivar,
    rootstock: plant.rootstock,
    form: plant.form,
    plantedYear: plant.plantedYear,
    heightM: plant.heightM,
    positionLabel: plant.positionLabel,
    healthFlags: plant.healthFlags,
    notes: plant.notes,
    archivedAt: plant.archivedAt?.toISOString() ?? null,
    createdAt: plant.createdAt.toISOString(),
    updatedAt: plant.updatedAt.toISOString(),
  };
}

const withSite = { model: Site, as: 'site', attributes: ['id', 'name'] };

function pickPlantFields(input: PlantInput) {
  const { siteId, typeCode, cultivar, rootstock, form, plantedYear, heightM, positionLabel, healthFlags, notes } = input;
  return Object.fromEntries(
    Object.entries({ siteId, typeCode, cultivar, rootstock, form, plantedYear, heightM, positionLabel, healthFlags, notes }).filter(([, v]) => v !== undefined),
  );
}

// A plant may only be put on a site of its own group: a site id from another group reads as unknown.
async function assertSiteInGroup(groupId: string, siteId: string | undefined): Promise<void> {
  if (!siteId) return;
  const site = await Site.findOne({ where: { id: siteId, groupId }, attributes: ['id'] });
  if (!site) throw validationFailed([{ path: 'siteId', message: 'Choose one of this group’s sites' }]);
}

async function findPlant(groupId: string, plantId: string): Promise<Plant> {
  const plant = await Plant.findOne({ where: { id: plantId, groupId }, include: [withSite] });
  if (!plant) throw notFound('Plant');
  return plant;
}

function sortOrder(query: PlantListQuery): Order {
  const direction = query.order === 'desc' ? 'DESC' : 'ASC';
  const primary: OrderItem = query.sort === 'siteName' ? [{ model: Site, as: 'site' }, 'name', direction] : [query.sort, direction];
  // A stable tie-break keeps paging from showing a plant twice or skipping one.
  return [primary, ['id', 'ASC']];
}

export async function listPlants(groupId: string, query: PlantListQuery): Promise<PlantList> {
  const like = query.search ? `%${query.search.replace(/[\\%_]/g, (c) => `\\${c}`)}%` : null;
  const where: WhereOptions = {
    groupId,
    ...(query.includeArchived ? {} : { archivedAt: null }),
    ...(query.siteId ? { siteId: query.siteId } : {}),
    ...(query.typeCode ? { typeCode: query.typeCode } : {}),
    ...(like
      ? { [Op.or]: [{ cultivar: { [Op.iLike]: like } }, { rootstock: { [Op.iLike]: like } }, { positionLabel: { [Op.iLike]: like } }, { notes: { [Op.iLike]: like } }, { typeCode: { [Op.iLike]: like } }] }
      : {}),
  };
  const { rows, count } = await Plant.findAndCountAll({
    where,
    include: [withSite],
    order: sortOrder(query),
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
  });
  return { items: rows.map(toPlant), total: count, page: query.page, pageSize: query.pageSize };
}

export async function getPlant(groupId: string, plantId: string): Promise<PlantDto> {
  return toPlant(await findPlant(groupId, plantId));
}

export async function createPlant(groupId: string, input: PlantInput): Promise<PlantDto> {
  await assertSiteInGroup(groupId, input.siteId);
  const plant = await Plant.create({ plantedYear: null, heightM: null, archivedAt: null, ...pickPlantFields(input), groupId } as unknown as Plant);
  return getPlant(groupId, plant.id);
}

export async function updatePlant(groupId: string, plantId: string, input: PlantInput): Promise<PlantDto> {
  const plant = await findPlant(groupId, plantId);
  await assertSiteInGroup(groupId, input.siteId);
  await plant.update(pickPlantFields(input));
  return getPlant(groupId, plantId);
}

export async function setPlantArchived(groupId: string, plantId: string, archived: boolean): Promise<PlantDto> {
  const plant = await findPlant(groupId, plantId);
  await plant.update({ archivedAt: archived ? new Date() : null });
  return toPlant(plant);
}

export async function deletePlant(groupId: string, plantId: string): Promise<void> {
  const plant = await findPlant(groupId, plantId);
  // The database drops the plant's photo rows with it; their files go too, once the rows are gone.
  const photos = await Photo.findAll({ where: { plantId, groupId }, attributes: ['groupId', 'fileName', 'thumbName'] });
  await plant.destroy();
  await removePhotoFiles(photos);
}
