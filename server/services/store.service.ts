import { Op } from 'sequelize';
import { KeepingRefusal, keepDates, keepTimes, storeState } from '../care/keeping';
import { sequelize } from '../db';
import { notFound, validationFailed } from '../lib/errors';
import { Plant, StoreBatch, StoreBatchPlant, User } from '../models';
import type { StoreBatch as StoreBatchDto, StoreList, storeBatchCreateSchema } from '../schemas/store';
import type { z } from 'zod';
import { groupToday, plantTitle } from './group-today';

// Stored produce: batches with their use-by dates, marked used (or put back) by anyone who logs work.

type BatchCreate = z.output<typeof storeBatchCreateSchema>;

async function toDtos(batches: StoreBatch[], today: string): Promise<StoreBatchDto[]> {
  const ids = batches.map((b) => b.id);
  const links = ids.length ? await StoreBatchPlant.findAll({ where: { batchId: ids } }) : [];
  const plants = links.length ? await Plant.findAll({ where: { id: [...new Set(links.map((l) => l.plantId))] }, attributes: ['id', 'cultivar', 'typeCode'] }) : [];
  const people = await User.findAll({ where: { id: [...new Set(batches.flatMap((b) => [b.usedBy, b.createdBy]).filter((id): id is string => !!id))] }, attributes: ['id', 'name'] });
  const plantById = new Map(plants.map((p) => [p.id, { id: p.id, name: plantTitle(p) }]));
  const nameOf = (id: string | null) => (id ? (people.find((p) => p.id === id)?.name ?? null) : null);
  return batches.map((b) => ({
    id: b.id, item: b.item, label: b.label, quantity: b.quantity, unit: b.unit, method: b.method,
    plants: links.filter((l) => l.batchId === b.id).map((l) => plantById.get(l.plantId)).filter((p) => p !== undefined),
    storedOn: b.storedOn, warnOn: b.warnOn, useBy: b.useBy, keepSource: b.keepSource, notes: b.notes,
    usedOn: b.usedOn, usedByName: nameOf(b.usedBy), storedByName: nameOf(b.createdBy), state: storeState(b, today),
  }));
}

export async function listStore(groupId: string, includeUsed: boolean): Promise<StoreList> {
  const today = await groupToday(groupId);
  const batches = await StoreBatch.findAll({
    where: { groupId, ...(includeUsed ? {} : { usedOn: null }) },
    order: [['useBy', 'ASC'], ['storedOn', 'ASC'], ['id', 'ASC']],
  });
  return { today, batches: await toDtos(batches, today), keepTimes: keepTimes() };
}

async function findBatch(groupId: string, batchId: string): Promise<StoreBatch> {
  const batch = await StoreBatch.findOne({ where: { id: batchId, groupId } });
  if (!batch) throw notFound('Batch');
  return batch;
}

function datesFor(input: BatchCreate) {
  try {
    return keepDates(input.item, input.method, input.storedOn);
  } catch (err) {
    if (err instanceof KeepingRefusal) throw validationFailed([{ path: 'method', message: err.message }]);
    throw err;
  }
}

export async function createBatch(groupId: string, userId: string, input: BatchCreate): Promise<StoreBatchDto> {
  const today = await groupToday(groupId);
  if (input.storedOn > today) throw validationFailed([{ path: 'storedOn', message: 'The stored date cannot be after today' }]);
  const dates = datesFor(input);
  const plantIds = [...new Set(input.plantIds)];
  const found = plantIds.length ? await Plant.count({ where: { id: { [Op.in]: plantIds }, groupId } }) : 0;
  if (found !== plantIds.length) throw validationFailed([{ path: 'plantIds', message: 'Choose plants of this group' }]);
  const batch = await sequelize.transaction(async (transaction) => {
    const created = await StoreBatch.create({
      groupId, item: input.item, label: input.label, quantity: input.quantity, unit: input.unit, method: input.method, storedOn: input.storedOn,
      warnOn: dates.warnOn, useBy: dates.useBy, keepSource: dates.source, notes: input.notes, usedOn: null, usedBy: null, createdBy: userId,
    }, { transaction });
    await StoreBatchPlant.bulkCreate(plantIds.map((plantId) => ({ batchId: created.id, plantId })), { transaction });
    return created;
  });
  return (await toDtos([batch], today))[0]!;
}

/** Marks a batch used on a day, or puts it back in store with null (the undo). */
export async function setBatchUsed(groupId: string, userId: string, batchId: string, usedOn: string | null): Promise<StoreBatchDto> {
  const batch = await findBatch(groupId, batchId);
  const today = await groupToday(groupId);
  if (usedOn && usedOn < batch.storedOn) throw validationFailed([{ path: 'usedOn', message: 'A batch cannot be used before it was stored' }]);
  if (usedOn && usedOn > today) throw validationFailed([{ path: 'usedOn', message: 'The used date cannot be after today' }]);
  await batch.update({ usedOn, usedBy: usedOn ? userId : null });
  return (await toDtos([batch], today))[0]!;
}

export async function deleteBatch(groupId: string, batchId: string): Promise<void> {
  const batch = await findBatch(groupId, batchId);
  await batch.destroy();
}
