import { ref, shallowRef, watch, type WatchSource } from 'vue';

/**
 * Server data for one view: { data, isLoading, error, reload }. Only the newest request may write,
 * so a slow answer for an old filter never overwrites a newer one.
 */
export function useResource<T>(load: () => Promise<T>, sources: WatchSource[] = []) {
  const data = shallowRef<T | null>(null);
  const isLoading = ref(false);
  const error = shallowRef<unknown>(null);
  let latest = 0;

  async function reload(): Promise<void> {
    const mine = ++latest;
    isLoading.value = true;
    error.value = null;
    try {
      const value = await load();
      if (mine === latest) data.value = value;
    } catch (err) {
      if (mine === latest) error.value = err;
    } finally {
      if (mine === latest) isLoading.value = false;
    }
  }

  watch(sources, () => void reload(), { immediate: true, deep: true });

  return { data, isLoading, error, reload };
}
