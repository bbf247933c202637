import { onBeforeUnmount, ref } from 'vue';

/** True while the media query matches; columns and layouts switch on it without CSS duplication. */
export function useMediaQuery(query: string) {
  const list = window.matchMedia(query);
  const matches = ref(list.matches);
  const onChange = (event: MediaQueryListEvent) => {
    matches.value = event.matches;
  };
  list.addEventListener('change', onChange);
  onBeforeUnmount(() => list.removeEventListener('change', onChange));
  return matches;
}
