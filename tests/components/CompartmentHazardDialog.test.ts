// @vitest-environment happy-dom
import type { Hazard } from '@shared/schemas/hazards';
import { PiniaColada } from '@pinia/colada';
import { DOMWrapper, flushPromises, mount } from '@vue/test-utils';
import { createPinia } from 'pinia';
import PrimeVue from 'primevue/config';
import { afterEach, describe, expect, it, vi } from 'vitest';
import CompartmentHazardDialog from '@/components/CompartmentHazardDialog.vue';

function json(status: number, body: unknown) {
  return new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });
}

function hazardFixture(overrides: Partial<Hazard> = {}): Hazard {
  return {
    id: 5,
    compartmentId: 3,
    kind: 'confined-space',
    notes: 'Single manhole',
    lastVerifiedOn: null,
    verifiedBy: null,
    updatedAt: '2026-01-01T00:00:00.000Z',
    version: 1,
    abilities: { update: true, delete: true },
    ...overrides,
  };
}

const STALE = {
  error: {
    code: 'conflict',
    message: 'Someone else changed this hazard since you opened it (notes). Reload to see their changes; yours are not saved.',
    fields: { version: 'current version is 2', notes: 'Changed by Colleague to "Manhole bolted shut".' },
  },
};

async function mountDialog(patchAnswers: Response[]) {
  const patches: unknown[] = [];
  const fetchMock = vi.fn((input: string | URL | Request, init?: RequestInit) => {
    const path = String(input);
    if (path.endsWith('/auth/csrf')) return Promise.resolve(json(200, { csrfToken: 'token' }));
    if (path.endsWith('/compartments/3/hazards/5') && init?.method === 'PATCH') {
      patches.push(JSON.parse(String(init.body)));
      return Promise.resolve(patchAnswers.shift()!);
    }
    if (path.endsWith('/compartments/3/hazards')) return Promise.resolve(json(200, [hazardFixture({ notes: 'Manhole bolted shut', version: 2 })]));
    return Promise.reject(new Error(`unexpected request ${path}`));
  });
  vi.stubGlobal('fetch', fetchMock);
  const wrapper = mount(CompartmentHazardDialog, {
    props: { visible: true, compartmentId: 3, hazard: hazardFixture() },
    global: { plugins: [createPinia(), PiniaColada, [PrimeVue, { unstyled: true }]] },
    attachTo: document.body,
  });
  await flushPromises();
  // The dialog is teleported to the body.
  return { wrapper, patches, page: new DOMWrapper(document.body) };
}

afterEach(() => {
  vi.unstubAllGlobals();
  document.body.innerHTML = '';
});

describe('CompartmentHazardDialog', () => {
  it('sends the version it opened; a stale save shows what changed and offers to reload, and the next save carries the new version', async () => {
    const { wrapper, patches, page } = await mountDialog([json(409, STALE), json(200, hazardFixture({ notes: 'Manhole bolted shut, tagged', version: 3 }))]);
    await page.find('textarea#hazard-notes').setValue('No ventilation');
    await page.find('form').trigger('submit');
    await flushPromises();

    expect(patches[0]).toMatchObject({ notes: 'No ventilation', version: 1 });
    const alert = page.find('[role=alert]');
    expect(alert.text()).toContain('Someone else changed this hazard since you opened it (notes).');
    expect(page.text()).toContain('Changed by Colleague to "Manhole bolted shut".');
    expect(wrapper.emitted('saved')).toBeUndefined();

    const reload = page.findAll('button').find((b) => b.text() === 'Reload')!;
    expect(reload.exists()).toBe(true);
    await reload.trigger('click');
    await flushPromises();
    expect((page.find('textarea#hazard-notes').element as HTMLTextAreaElement).value).toBe('Manhole bolted shut');
    expect(page.find('[role=alert]').exists()).toBe(false);

    await page.find('textarea#hazard-notes').setValue('Manhole bolted shut, tagged');
    await page.find('form').trigger('submit');
    await flushPromises();
    expect(patches[1]).toMatchObject({ notes: 'Manhole bolted shut, tagged', version: 2 });
    expect(wrapper.emitted('saved')?.[0]?.[0]).toMatchObject({ version: 3 });
  });
});
