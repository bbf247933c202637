import { createApp } from 'vue';
import { createPinia } from 'pinia';
import App from './App.vue';
import { installPrimeVue } from './plugins/primevue';
import { router } from './router';
import { setUnauthenticatedHandler } from './api/http';
import { useSessionStore } from './stores/session';
import { useGroupsStore } from './stores/groups';

const app = createApp(App);
const pinia = createPinia();
app.use(pinia);
installPrimeVue(app);
app.use(router);

// The one place a 401 is handled: the session has gone, so forget it and ask the person to sign in,
// then bring them back to where they were.
setUnauthenticatedHandler(() => {
  useSessionStore(pinia).clear();
  useGroupsStore(pinia).clear();
  const current = router.currentRoute.value;
  if (current.meta.requiresAuth) {
    void router.push({ name: 'sign-in', query: { redirect: current.fullPath } });
  }
});

app.mount('#app');
