import type { Action, Resource } from '@shared/permissions';
import { createRouter, createWebHistory } from 'vue-router';
import { whenUnauthenticated } from '@/api/client';
import { useSessionStore } from '@/stores/session';
// The landing page is in the entry: a visitor's first page then needs no second round of chunks
// (every other page is its own chunk; tests/unit/public-code.test.ts keeps it that way)
import VisitHomeView from '@/views/visit/VisitHomeView.vue';
import VisitLayout from '@/views/visit/VisitLayout.vue';

/** A resource with one of its own actions (a plain `Action` would allow only those every resource has). */
type ScreenPermission = { [R in Resource]: { resource: R; action: Action<R> } }[Resource];

declare module 'vue-router' {
  interface RouteMeta {
    /** Signed-in staff only. */
    staff?: boolean;
    /** The permission the screen needs; the navigation hides what the user may not use. */
    permission?: ScreenPermission;
    title?: string;
    /** The screen keeps its state in the query (the ship map): a change of the query alone leaves the page where it is scrolled. */
    queryState?: boolean;
  }
}

export const router = createRouter({
  history: createWebHistory(),
  scrollBehavior: (to, from) => (to.meta.queryState && to.name === from.name ? false : { top: 0 }),
  routes: [
    { path: '/', redirect: { name: 'visit-home' } },
    { path: '/sign-in', name: 'sign-in', component: () => import('@/views/SignInView.vue'), meta: { title: 'Sign in' } },
    { path: '/forgot-password', name: 'forgot-password', component: () => import('@/views/ForgotPasswordView.vue'), meta: { title: 'Forgot password' } },
    { path: '/reset-password', name: 'reset-password', component: () => import('@/views/ResetPasswordView.vue'), meta: { title: 'Choose a new password' } },
    { path: '/invitation', name: 'accept-invitation', component: () => import('@/views/AcceptInvitationView.vue'), meta: { title: 'Accept your invitation' } },
    {
      path: '/visit',
      component: VisitLayout,
      children: [
        { path: '', name: 'visit-home', component: VisitHomeView, meta: { title: 'Visit' } },
        { path: 'tours/:slug', name: 'visit-tour', component: () => import('@/views/visit/VisitTourView.vue'), meta: { title: 'Tour' } },
        { path: 'tours/:slug/stops/:n', name: 'visit-stop', component: () => import('@/views/visit/VisitStopView.vue'), meta: { title: 'Tour stop' } },
        { path: 'appeals', name: 'visit-appeals', component: () => import('@/views/visit/VisitAppealsView.vue'), meta: { title: 'Help us repair' } },
        { path: 'appeals/:slug', name: 'visit-appeal', component: () => import('@/views/visit/VisitAppealView.vue'), meta: { title: 'Help us repair' } },
        { path: 'appeals/:slug/thanks', name: 'visit-gift-thanks', component: () => import('@/views/visit/VisitGiftThanksView.vue'), meta: { title: 'Thank you' } },
        { path: 'appeals/:slug/cancelled', name: 'visit-gift-cancelled', component: () => import('@/views/visit/VisitGiftCancelledView.vue'), meta: { title: 'Gift not made' } },
      ],
    },
    {
      path: '/app',
      component: () => import('@/views/staff/StaffLayout.vue'),
      meta: { staff: true },
      children: [
        { path: '', name: 'staff-home', component: () => import('@/views/staff/OverviewView.vue'), meta: { title: 'Overview' } },
        { path: 'vessels', name: 'vessels', component: () => import('@/views/staff/VesselsView.vue'), meta: { title: 'Vessels', permission: { resource: 'vessel', action: 'read' } } },
        { path: 'ship', name: 'ship-map', component: () => import('@/views/staff/ShipMapView.vue'), meta: { title: 'Ship map', permission: { resource: 'deck', action: 'read' }, queryState: true } },
        { path: 'compartments', name: 'compartments', component: () => import('@/views/staff/CompartmentsView.vue'), meta: { title: 'Compartments', permission: { resource: 'compartment', action: 'read' } } },
        { path: 'compartments/:id', name: 'compartment', component: () => import('@/views/staff/CompartmentView.vue'), meta: { title: 'Compartment', permission: { resource: 'compartment', action: 'read' } } },
        { path: 'collection', name: 'artifacts', component: () => import('@/views/staff/ArtifactsView.vue'), meta: { title: 'Collection', permission: { resource: 'artifact', action: 'read' } } },
        { path: 'collection/import', name: 'artifact-import', component: () => import('@/views/staff/ArtifactImportView.vue'), meta: { title: 'Import artifacts', permission: { resource: 'artifact', action: 'import' } } },
        { path: 'collection/:id', name: 'artifact', component: () => import('@/views/staff/ArtifactView.vue'), meta: { title: 'Artifact', permission: { resource: 'artifact', action: 'read' } } },
        { path: 'condition', name: 'condition-reports', component: () => import('@/views/staff/ConditionReportsView.vue'), meta: { title: 'Condition', permission: { resource: 'conditionReport', action: 'read' } } },
        { path: 'condition/:id', name: 'condition-report', component: () => import('@/views/staff/ConditionReportView.vue'), meta: { title: 'Condition report', permission: { resource: 'conditionReport', action: 'read' } } },
        { path: 'incidents', name: 'incidents', component: () => import('@/views/staff/IncidentsView.vue'), meta: { title: 'Incidents', permission: { resource: 'incident', action: 'read' } } },
        { path: 'incidents/:id', name: 'incident', component: () => import('@/views/staff/IncidentView.vue'), meta: { title: 'Incident', permission: { resource: 'incident', action: 'read' } } },
        { path: 'interpretation', name: 'interpretations', component: () => import('@/views/staff/InterpretationsView.vue'), meta: { title: 'Interpretation', permission: { resource: 'interpretation', action: 'read' } } },
        { path: 'risks', name: 'risks', component: () => import('@/views/staff/RisksView.vue'), meta: { title: 'Risk register', permission: { resource: 'risk', action: 'read' } } },
        { path: 'repairs', name: 'repair-projects', component: () => import('@/views/staff/RepairProjectsView.vue'), meta: { title: 'Repair projects', permission: { resource: 'repairProject', action: 'read' } } },
        { path: 'repairs/:id', name: 'repair-project', component: () => import('@/views/staff/RepairProjectView.vue'), meta: { title: 'Repair project', permission: { resource: 'repairProject', action: 'read' } } },
        { path: 'tours', name: 'tours', component: () => import('@/views/staff/ToursView.vue'), meta: { title: 'Tours', permission: { resource: 'tour', action: 'read' } } },
        { path: 'tours/:id', name: 'tour', component: () => import('@/views/staff/TourView.vue'), meta: { title: 'Tour', permission: { resource: 'tour', action: 'read' } } },
        { path: 'giving', name: 'giving', component: () => import('@/views/staff/GivingView.vue'), meta: { title: 'Giving', permission: { resource: 'donation', action: 'read' } } },
        { path: 'people', name: 'people', component: () => import('@/views/staff/PeopleView.vue'), meta: { title: 'People', permission: { resource: 'user', action: 'read' } } },
        { path: 'audit-trail', name: 'audit-trail', component: () => import('@/views/staff/AuditTrailView.vue'), meta: { title: 'Audit trail', permission: { resource: 'auditEvent', action: 'read' } } },
        { path: 'outbox', name: 'outbox', component: () => import('@/views/staff/OutboxView.vue'), meta: { title: 'Outbox', permission: { resource: 'outbox', action: 'read' } } },
        { path: 'settings', name: 'settings', component: () => import('@/views/staff/SettingsView.vue'), meta: { title: 'Settings', permission: { resource: 'settings', action: 'update' } } },
        { path: 'account', name: 'account', component: () => import('@/views/staff/AccountView.vue'), meta: { title: 'Your account' } },
        { path: 'forbidden', name: 'forbidden', component: () => import('@/views/ForbiddenView.vue'), meta: { title: 'Not for your role' } },
      ],
    },
    { path: '/:pathMatch(.*)*', name: 'not-found', component: () => import('@/views/NotFoundView.vue'), meta: { title: 'Page not found' } },
  ],
});

router.beforeEach(async (to) => {
  if (!to.path.startsWith('/visit')) await import('@/theme-all').then((m) => m.addAllComponentTokens());
  const session = useSessionStore();
  if (to.matched.some((r) => r.meta.staff)) {
    const user = await session.load().catch(() => null);
    if (!user) return { name: 'sign-in', query: { next: to.fullPath } };
    const permission = to.meta.permission;
    if (permission && !session.can(permission.resource, permission.action as never)) {
      return { name: 'forbidden', query: { from: to.fullPath } };
    }
  }
  if (to.name === 'sign-in' && (await session.load().catch(() => null))) return { name: 'staff-home' };
  return true;
});

router.afterEach((to) => {
  document.title = to.meta.title ? `${to.meta.title} · Shipkeeper` : 'Shipkeeper';
});

whenUnauthenticated(() => {
  const session = useSessionStore();
  session.forget();
  const current = router.currentRoute.value;
  if (current.matched.some((r) => r.meta.staff)) void router.push({ name: 'sign-in', query: { next: current.fullPath, expired: '1' } });
});
