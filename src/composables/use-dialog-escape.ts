import type { Ref } from 'vue';

/**
 * PrimeVue's Select swallows Escape even when its list is closed, so a dialog whose focus sits on a
 * Select would not close on Esc. Listening in the capture phase restores the expected behaviour;
 * an open list still gets the first Escape to close itself.
 */
export function useDialogEscape(visible: Ref<boolean>) {
  return (event: KeyboardEvent): void => {
    const target = event.target as HTMLElement | null;
    if (target?.getAttribute('aria-expanded') === 'true') return;
    visible.value = false;
  };
}
