// @vitest-environment happy-dom
import { mount } from '@vue/test-utils';
import { createPinia, setActivePinia } from 'pinia';
import { describe, expect, it } from 'vitest';
import { createMemoryHistory, createRouter } from 'vue-router';
import { permissionsFor } from '@shared/permissions';
import type { Role } from '@shared/roles';
import AppNav from '@/components/AppNav.vue';
import { STAFF_NAV } from '@/components/navigation';
import { useSessionStore } from '@/stores/session';

function routerWithNavRoutes() {
  const Empty = { template: '<div />' };
  return createRouter({ history: createMemoryHistory(), routes: STAFF_NAV.map((e) => ({ path: `/${e.route}`, name: e.route, component: Empty })) });
}

async function renderFor(role: Role) {
  const pinia = createPinia();
  setActivePinia(pinia);
  useSessionStore().user = { id: 1, email: `${role}@example.test`, name: 'Test', role, permissions: permissionsFor(role) };
  const router = routerWithNavRoutes();
  await router.push('/staff-home');
  const wrapper = mount(AppNav, { global: { plugins: [pinia, router] } });
  return wrapper.findAll('a').map((a) => a.text());
}

const SHARED = ['Overview', 'Vessels', 'Ship map', 'Compartments', 'Collection', 'Condition', 'Incidents', 'Interpretation', 'Risk register', 'Tours', 'Repair projects'];

describe('AppNav', () => {
  it('shows an administrator every part that exists', async () => {
    expect(await renderFor('admin')).toEqual([...SHARED, 'Giving', 'People', 'Audit trail', 'Outbox', 'Settings']);
  });

  // Giving is for the roles that read gifts: fundraisers, curators and administrators.
  it.each([
    ['curator', [...SHARED, 'Giving']],
    ['conservator', SHARED],
    ['docent', SHARED],
    ['fundraiser', [...SHARED, 'Giving']],
  ] as const)('hides the administration parts from %s', async (role, expected) => {
    expect(await renderFor(role)).toEqual(expected);
  });
});
