// @vitest-environment happy-dom
import { PiniaColada } from '@pinia/colada';
import { flushPromises, mount } from '@vue/test-utils';
import { createPinia } from 'pinia';
import PrimeVue from 'primevue/config';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { createMemoryHistory, createRouter } from 'vue-router';
import { useVesselStore } from '@/stores/vessel';
import ArtifactsView from '@/views/staff/ArtifactsView.vue';

function json(status: number, body: unknown) {
  return new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });
}

const item = {
  id: 7,
  vesselId: 1,
  objectNumber: '2019.4.12',
  name: 'Steam gauge',
  category: 'instruments-and-gauges',
  status: 'in-place',
  location: { compartmentId: 4, compartmentDesignation: '2-40-0-E', compartmentName: 'Boiler room', deckId: 2, deckName: 'Second deck', point: null },
  cover: null,
  updatedAt: '2026-12-01T10:00:00.000Z',
  version: 1,
  highlight: null,
};

afterEach(() => {
  vi.unstubAllGlobals();
  document.body.innerHTML = '';
});

describe('ArtifactsView', () => {
  it('shows the compartment name beside its designation', async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn((input: string | URL | Request) => {
        const path = String(input);
        if (path.includes('/vessels/1/artifacts')) return Promise.resolve(json(200, { items: [item], total: 1, page: 1, pageSize: 25 }));
        return Promise.resolve(json(200, path.includes('/decks') ? [] : { items: [], total: 0, page: 1, pageSize: 100 }));
      }),
    );
    const pinia = createPinia();
    const router = createRouter({
      history: createMemoryHistory(),
      routes: [
        { path: '/artifacts', name: 'artifacts', component: ArtifactsView },
        { path: '/artifacts/:id', name: 'artifact', component: { template: '<div />' } },
      ],
    });
    await router.push('/artifacts');
    const wrapper = mount(ArtifactsView, { global: { plugins: [pinia, PiniaColada, router, [PrimeVue, { unstyled: true }]] } });
    const vessels = useVesselStore(pinia);
    vessels.vessels = [{ id: 1, name: 'Test vessel' }] as unknown as typeof vessels.vessels;
    await flushPromises();
    await vi.waitFor(() => expect(wrapper.text()).toContain('2019.4.12'));
    // The location column and the small-screen line under the number both name the room.
    const cell = wrapper.findAll('td').find((td) => td.find('.artifacts-table__designation').exists())!;
    expect(cell.findAll('span').map((span) => span.text())).toEqual(['2-40-0-E', 'Boiler room', 'Second deck']);
    expect(wrapper.find('.artifacts-table__sub').text()).toContain('2-40-0-E Boiler room');
  });
});
