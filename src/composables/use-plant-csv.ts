import { ref, shallowRef } from 'vue';
import type { PlantCsvPreview } from '../../server/schemas/plant-csv';
import { importPlantCsv, previewPlantCsv } from '../api/plant-csv';
import { useGroupsStore } from '../stores/groups';

/** The two steps of a plant import: read the file and preview every row, then import all or none. */
export function usePlantCsv() {
  const groups = useGroupsStore();
  const text = ref('');
  const fileName = ref('');
  const preview = shallowRef<PlantCsvPreview | null>(null);
  const isReading = ref(false);
  const error = shallowRef<unknown>(null);

  async function read(file: File): Promise<void> {
    if (!groups.currentGroupId) return;
    isReading.value = true;
    error.value = null;
    preview.value = null;
    try {
      fileName.value = file.name;
      text.value = await file.text();
      preview.value = await previewPlantCsv(groups.currentGroupId, text.value);
    } catch (err) {
      error.value = err;
    } finally {
      isReading.value = false;
    }
  }

  function clear(): void {
    text.value = '';
    fileName.value = '';
    preview.value = null;
    error.value = null;
  }

  const importAll = async () => importPlantCsv(groups.currentGroupId ?? '', text.value);

  return { fileName, preview, isReading, error, read, clear, importAll };
}
