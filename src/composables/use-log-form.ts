import { ref, shallowRef, watch } from 'vue';
import { feedUnits, logEntryCreateSchema, type FeedUnit, type LogEntry, type LogGuard, type LogKind, leafSizeBands, pruneTypes } from '../../server/schemas/log';
import { checkCut } from '../api/log';
import { useGroupsStore } from '../stores/groups';
import { useForm } from './use-form';
import { useLogActions } from './use-log';
import { useNotify } from './use-notify';
import { todayLocal } from './use-dates';

// The log form's state, flat so that every field (details.product, details.npk.n…) has its own
// error under its own input; `prepare` builds the nested body the shared schema checks.

export interface LogFormValues {
  kind: LogKind | null; doneOn: string; doneBy: string | null; plantIds: string[]; notes: string; overrideReason: string;
  pruneType: (typeof pruneTypes)[number] | null;
  product: string; n: number | null; p: number | null; k: number | null; amount: number | null; unit: FeedUnit; areaM2: number | null;
  material: string; fruitsPerCluster: number | null; spacingCm: number | null;
  leafCount: number | null; sizeBand: (typeof leafSizeBands)[number];
  weightKg: number | null; count: number | null; harvestIntervalDays: number | null; litres: number | null;
}

const orUndefined = (x: number | null) => x ?? undefined;

function detailsOf(v: LogFormValues): unknown {
  switch (v.kind) {
    case 'prune': return { pruneType: v.pruneType ?? undefined };
    case 'feed': return {
      product: v.product, amount: orUndefined(v.amount), unit: v.unit, areaM2: v.areaM2,
      // Any one of the three given means the bag's numbers were read; the blanks are zero.
      npk: v.n === null && v.p === null && v.k === null ? null : { n: v.n ?? 0, p: v.p ?? 0, k: v.k ?? 0 },
    };
    case 'mulch': return { material: v.material };
    case 'thin': return { fruitsPerCluster: v.fruitsPerCluster, spacingCm: v.spacingCm };
    case 'leaf-pick': return { leafCount: orUndefined(v.leafCount), sizeBand: v.sizeBand };
    case 'harvest': return { weightKg: v.weightKg, count: v.count };
    case 'spray': return { product: v.product, harvestIntervalDays: orUndefined(v.harvestIntervalDays) };
    case 'water': return { litres: v.litres };
    default: return {};
  }
}

export function prepareLog(v: LogFormValues): unknown {
  return {
    kind: v.kind ?? undefined, doneOn: v.doneOn, plantIds: v.plantIds, notes: v.notes, details: detailsOf(v),
    ...(v.doneBy ? { doneBy: v.doneBy } : {}), ...(v.overrideReason.trim() ? { overrideReason: v.overrideReason } : {}),
  };
}

const blank = (plantIds: string[]): LogFormValues => ({
  kind: null, doneOn: todayLocal(), doneBy: null, plantIds, notes: '', overrideReason: '', pruneType: null,
  product: '', n: null, p: null, k: null, amount: null, unit: feedUnits[0], areaM2: null, material: '',
  fruitsPerCluster: null, spacingCm: null, leafCount: null, sizeBand: '10-15', weightKg: null, count: null, harvestIntervalDays: null, litres: null,
});

export function useLogForm(presetPlantIds: () => string[], onSaved: (entry: LogEntry) => void) {
  const groups = useGroupsStore();
  const notify = useNotify();
  const actions = useLogActions();
  const photos = ref<File[]>([]);
  const guard = shallowRef<LogGuard | null>(null);
  const form = useForm(logEntryCreateSchema, () => blank(presetPlantIds()), {
    prepare: prepareLog,
    failureTitle: 'Could not save',
    messages: {
      kind: 'Choose what was done', pruneType: 'Choose which prune it was', amount: 'Give the amount, more than 0',
      leafCount: 'Count the leaves picked', harvestIntervalDays: 'Give the label’s harvest interval in days (0 if it has none)',
    },
  });
  const v = form.values;

  // A cut on stone fruit is checked as soon as the kind, day and plants are known, before saving.
  let asked = 0;
  watch(() => [v.value.kind, v.value.doneOn, v.value.plantIds.join(',')] as const, async ([kind, day, ids]) => {
    const mine = ++asked;
    if (kind !== 'prune' || !ids || !/^\d{4}-\d{2}-\d{2}$/.test(day) || !groups.currentGroupId) return void (guard.value = null);
    try {
      const answer = await checkCut(groups.currentGroupId, day, ids.split(','));
      if (mine === asked) guard.value = answer.plants.length ? answer : null;
    } catch {
      if (mine === asked) guard.value = null; // The server checks again on saving.
    }
  }, { immediate: true });

  async function save(data: Parameters<typeof actions.create>[0]): Promise<void> {
    const entry = await actions.create(data);
    let failed = 0;
    for (const file of photos.value) {
      try {
        entry.photos.push(await actions.addEntryPhoto(entry.id, file));
      } catch (err) {
        failed += 1;
        notify.error(err, 'Saved, but a photo did not upload');
      }
    }
    if (!failed) notify.success('Saved to the log');
    onSaved(entry);
  }

  return { ...form, photos, guard, submit: () => form.submit(save) };
}
