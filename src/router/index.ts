import { createRouter, createWebHistory, type RouteLocationRaw } from 'vue-router';
import { useSessionStore } from '../stores/session';
import { useGroupsStore } from '../stores/groups';

declare module 'vue-router' {
  interface RouteMeta {
    title?: string;
    requiresAuth?: boolean;
    /** Signed-in people skip these (sign-in, register…) and go to their plants. */
    guestOnly?: boolean;
    /** The page shows a group's data; with no group yet the first-run page stands in. */
    requiresGroup?: boolean;
  }
}

export const router = createRouter({
  history: createWebHistory(),
  scrollBehavior: (_to, _from, saved) => saved ?? { top: 0 },
  routes: [
    { path: '/', name: 'home', component: () => import('../views/HomeView.vue'), meta: { guestOnly: true } },
    { path: '/sign-in', name: 'sign-in', component: () => import('../views/SignInView.vue'), meta: { guestOnly: true, title: 'Sign in' } },
    { path: '/register', name: 'register', component: () => import('../views/RegisterView.vue'), meta: { guestOnly: true, title: 'Create an account' } },
    { path: '/forgot-password', name: 'forgot-password', component: () => import('../views/ForgotPasswordView.vue'), meta: { guestOnly: true, title: 'Forgotten password' } },
    { path: '/reset-password', name: 'reset-password', component: () => import('../views/ResetPasswordView.vue'), meta: { title: 'Choose a new password' } },
    { path: '/account', name: 'account', component: () => import('../views/AccountView.vue'), meta: { requiresAuth: true, title: 'Account' } },
    { path: '/account/reminders', name: 'reminder-preferences', component: () => import('../views/ReminderPreferencesView.vue'), meta: { requiresAuth: true, title: 'Reminder e-mails' } },
    { path: '/operations', name: 'operations', component: () => import('../views/OperationsView.vue'), meta: { requiresAuth: true, title: 'Reminder worker' } },
    { path: '/groups', name: 'groups', component: () => import('../views/GroupsView.vue'), meta: { requiresAuth: true, title: 'Groups' } },
    { path: '/plants', name: 'plants', component: () => import('../views/PlantsView.vue'), meta: { requiresAuth: true, requiresGroup: true, title: 'Plants' } },
    { path: '/plants/:plantId', name: 'plant', component: () => import('../views/PlantView.vue'), props: true, meta: { requiresAuth: true, requiresGroup: true, title: 'Plant' } },
    { path: '/sites', name: 'sites', component: () => import('../views/SitesView.vue'), meta: { requiresAuth: true, requiresGroup: true, title: 'Sites' } },
    { path: '/sites/:siteId', name: 'site', component: () => import('../views/SiteView.vue'), props: true, meta: { requiresAuth: true, requiresGroup: true, title: 'Site' } },
    { path: '/log', name: 'log', component: () => import('../views/LogView.vue'), meta: { requiresAuth: true, requiresGroup: true, title: 'Work log' } },
    { path: '/sites/:siteId/report', name: 'site-report', component: () => import('../views/SiteReportView.vue'), props: true, meta: { requiresAuth: true, requiresGroup: true, title: 'Season report' } },
    { path: '/jobs', name: 'jobs', component: () => import('../views/JobsView.vue'), meta: { requiresAuth: true, requiresGroup: true, title: 'Jobs' } },
    { path: '/store', name: 'store', component: () => import('../views/StoreView.vue'), meta: { requiresAuth: true, requiresGroup: true, title: 'Store' } },
    { path: '/members', name: 'members', component: () => import('../views/MembersView.vue'), meta: { requiresAuth: true, requiresGroup: true, title: 'People' } },
    // Open to everyone: a signed-in person joins with their account, a newcomer makes one here.
    { path: '/invitations/:token', name: 'invitation', component: () => import('../views/InvitationView.vue'), props: true, meta: { title: 'Invitation' } },
    { path: '/tools', name: 'tools', component: () => import('../views/ToolsView.vue'), meta: { title: 'Tools' } },
    { path: '/tools/stone-fruit-check', name: 'tool-stone-fruit', component: () => import('../views/ToolStoneFruitView.vue'), meta: { title: 'Stone-fruit check' } },
    { path: '/tools/ladder', name: 'tool-ladder', component: () => import('../views/ToolLadderView.vue'), meta: { title: 'Ladder planner' } },
    { path: '/tools/degree-days', name: 'tool-degree-days', component: () => import('../views/ToolDegreeDaysView.vue'), meta: { title: 'Degree-day calculator' } },
    { path: '/:pathMatch(.*)*', name: 'not-found', component: () => import('../views/NotFoundView.vue'), meta: { title: 'Not found' } },
  ],
});

/** Only same-app paths may come back through ?redirect=, never another site ("//evil.example"). */
export function safeRedirect(value: unknown): RouteLocationRaw | null {
  if (typeof value !== 'string' || !value.startsWith('/') || value.startsWith('//')) return null;
  const target = router.resolve(value);
  return target.matched.length > 0 && target.name !== 'not-found' ? target.fullPath : null;
}

/** Where a person lands after signing in or registering: back to where they were, or their plants. */
export function landingAfterSignIn(redirect: unknown): RouteLocationRaw {
  return safeRedirect(redirect) ?? { name: 'plants' };
}

router.beforeEach(async (to) => {
  const session = useSessionStore();
  await session.ensureLoaded();
  if (to.meta.requiresAuth && !session.isSignedIn) {
    return { name: 'sign-in', query: { redirect: to.fullPath } };
  }
  if (to.meta.guestOnly && session.isSignedIn) {
    return landingAfterSignIn(to.query.redirect);
  }
  if (session.isSignedIn) await useGroupsStore().ensureLoaded();
  return true;
});

router.afterEach((to) => {
  document.title = to.meta.title ? `${to.meta.title} · Spurwood` : 'Spurwood';
});
