import { ref } from 'vue';

export interface Place {
  latitude: number;
  longitude: number;
}

// Three decimals (about 100 m) is plenty for seasons and sun times, and says less about where
// someone lives than the phone's full fix would.
const round3 = (x: number) => Math.round(x * 1000) / 1000;

/** "Use my location": one reading from the phone, with a plain message when it cannot be had. */
export function useGeolocation() {
  const isLocating = ref(false);
  const error = ref<string | null>(null);
  const isSupported = typeof navigator !== 'undefined' && 'geolocation' in navigator;

  function locate(): Promise<Place | null> {
    error.value = null;
    if (!isSupported) {
      error.value = 'This browser cannot share a location; type the latitude and longitude instead.';
      return Promise.resolve(null);
    }
    isLocating.value = true;
    return new Promise((resolve) => {
      navigator.geolocation.getCurrentPosition(
        (position) => {
          isLocating.value = false;
          resolve({ latitude: round3(position.coords.latitude), longitude: round3(position.coords.longitude) });
        },
        (err) => {
          isLocating.value = false;
          error.value = err.code === err.PERMISSION_DENIED
            ? 'Location is turned off for this site. Allow it in the browser, or type the latitude and longitude.'
            : 'Could not get a location just now. Try again, or type the latitude and longitude.';
          resolve(null);
        },
        { enableHighAccuracy: false, timeout: 15_000, maximumAge: 10 * 60_000 },
      );
    });
  }

  return { isLocating, error, isSupported, locate };
}
