import { defineStore } from 'pinia';
import { computed, ref } from 'vue';
import type { PasswordChange, Person, Register, SignIn } from '../../server/schemas/auth';
import * as authApi from '../api/auth';
import { ApiError } from '../api/http';

export const useSessionStore = defineStore('session', () => {
  const person = ref<Person | null>(null);
  const isLoaded = ref(false);
  /** Set when the server could not be asked at all; App shows it with a retry. */
  const loadError = ref<unknown>(null);
  const isSignedIn = computed(() => person.value !== null);
  let loading: Promise<void> | null = null;

  async function fetchMe(): Promise<void> {
    try {
      person.value = await authApi.getMe();
      loadError.value = null;
      isLoaded.value = true;
    } catch (err) {
      person.value = null;
      // A 401 only means "nobody signed in yet"; anything else is shown, and the next navigation asks again.
      const isGuest = err instanceof ApiError && err.status === 401;
      loadError.value = isGuest ? null : err;
      isLoaded.value = isGuest;
    } finally {
      loading = null;
    }
  }

  /** The router guard calls this on every navigation; only the first one asks the server. */
  function ensureLoaded(): Promise<void> {
    if (isLoaded.value) return Promise.resolve();
    loading ??= fetchMe();
    return loading;
  }

  async function signIn(body: SignIn): Promise<Person> {
    person.value = await authApi.signIn(body);
    isLoaded.value = true;
    return person.value;
  }

  async function register(body: Register): Promise<Person> {
    person.value = await authApi.register(body);
    isLoaded.value = true;
    return person.value;
  }

  async function signOut(): Promise<void> {
    await authApi.signOut();
    person.value = null;
  }

  const changePassword = (body: PasswordChange) => authApi.changePassword(body);

  /** Used when the server says the session has gone (expired, or signed out on another tab). */
  function clear(): void {
    person.value = null;
    isLoaded.value = true;
  }

  return { person, isLoaded, loadError, isSignedIn, ensureLoaded, signIn, register, signOut, changePassword, clear };
});
