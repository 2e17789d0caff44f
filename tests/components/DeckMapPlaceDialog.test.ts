// @vitest-environment happy-dom
import { PiniaColada } from '@pinia/colada';
import { DOMWrapper, flushPromises, mount } from '@vue/test-utils';
import { createPinia } from 'pinia';
import PrimeVue from 'primevue/config';
import { afterEach, describe, expect, it, vi } from 'vitest';
import DeckMapPlaceDialog from '@/components/DeckMapPlaceDialog.vue';
import { isoDate } from '@/utils/format';
import { compartmentFixture } from './render';

function json(status: number, body: unknown) {
  return new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });
}

const artifact = { id: 7, objectNumber: '2019.4.12', name: 'Steam gauge', status: 'in-place' as const, version: 3 };
const boilerRoom = compartmentFixture({ id: 4, designation: '2-40-0-E', name: 'Boiler room' });

async function mountDialog(answer: () => Response, extra: Record<string, unknown> = {}) {
  const fetchMock = vi.fn((input: string | URL | Request, init?: RequestInit) => {
    const path = String(input);
    if (path.endsWith('/auth/csrf')) return Promise.resolve(json(200, { csrfToken: 'token' }));
    if (path.endsWith('/artifacts/7/moves') && init?.method === 'POST') return Promise.resolve(answer());
    return Promise.reject(new Error(`unexpected request ${path}`));
  });
  vi.stubGlobal('fetch', fetchMock);
  const pinia = createPinia();
  const wrapper = mount(DeckMapPlaceDialog, {
    props: { visible: true, artifact, from: '2-62-0-E · Engine room', to: boilerRoom, point: [1900, 450], ...extra },
    global: { plugins: [pinia, PiniaColada, [PrimeVue, { unstyled: true }]] },
    attachTo: document.body,
  });
  await flushPromises();
  // The dialog is teleported to the body.
  return { wrapper, fetchMock, page: new DOMWrapper(document.body) };
}

const movesCalls = (fetchMock: ReturnType<typeof vi.fn>) => fetchMock.mock.calls.filter(([input]) => String(input).endsWith('/moves'));

afterEach(() => {
  vi.unstubAllGlobals();
  document.body.innerHTML = '';
});

describe('DeckMapPlaceDialog', () => {
  it('says where from and where to, asks for a reason before sending, then records the move', async () => {
    const { wrapper, fetchMock, page } = await mountDialog(() => json(201, { id: 7 }));
    expect(page.text()).toContain('From 2-62-0-E · Engine room');
    expect(page.text()).toContain('2-40-0-E · Boiler room');
    expect((page.find('input#place-reason').element as HTMLInputElement).value).toBe('');

    await page.find('form').trigger('submit');
    await flushPromises();
    expect(page.text()).toContain('Reason is required.');
    expect(movesCalls(fetchMock)).toHaveLength(0);

    await page.find('input#place-reason').setValue('Moved for display');
    await page.find('form').trigger('submit');
    await flushPromises();
    const [, init] = movesCalls(fetchMock)[0]!;
    expect(JSON.parse(String(init!.body))).toEqual({
      compartmentId: 4,
      point: [1900, 450],
      status: 'in-place',
      reason: 'Moved for display',
      movedOn: isoDate(new Date()),
      version: 3,
    });
    expect(wrapper.emitted('saved')).toEqual([[{ id: 7 }]]);
    expect(wrapper.emitted('update:visible')).toEqual([[false]]);
  });

  it('puts an artifact on the plan of the compartment it is recorded in without asking why, keeping its status', async () => {
    const stored = { ...artifact, status: 'in-store' as const };
    const { wrapper, fetchMock, page } = await mountDialog(() => json(201, { id: 7 }), { artifact: stored, from: '2-40-0-E · Boiler room, no point on the plan', firstPlacement: true });
    expect(page.text()).toContain('Place on the plan');
    expect(page.text()).toContain('Its first point on the plan, in 2-40-0-E · Boiler room');
    expect(page.text()).not.toContain('From 2-40-0-E');
    expect(page.find('input#place-reason').exists()).toBe(false);

    await page.find('form').trigger('submit');
    await flushPromises();
    const [, init] = movesCalls(fetchMock)[0]!;
    expect(JSON.parse(String(init!.body))).toEqual({ compartmentId: 4, point: [1900, 450], status: 'in-store', version: 3 });
    expect(wrapper.emitted('saved')).toEqual([[{ id: 7 }]]);
  });

  it('hands a 409 back as refused and closes, since nothing in the form can fix it', async () => {
    const { wrapper, page } = await mountDialog(() =>
      json(409, { error: { code: 'conflict', message: 'Someone else changed this artifact since you opened it (status).', fields: { status: 'Changed to "on-loan".' } } }),
    );
    await page.find('input#place-reason').setValue('Moved for display');
    await page.find('form').trigger('submit');
    await flushPromises();
    const refused = wrapper.emitted('refused') as [{ status: number; message: string }][];
    expect(refused[0]![0].status).toBe(409);
    expect(wrapper.emitted('update:visible')).toEqual([[false]]);
    expect(wrapper.emitted('saved')).toBeUndefined();
  });

  it('keeps a field error from the server beside its field', async () => {
    const { wrapper, page } = await mountDialog(() => json(400, { error: { code: 'validation', message: 'Some fields need attention.', fields: { movedOn: 'The date cannot be in the future.' } } }));
    await page.find('input#place-reason').setValue('Moved for display');
    await page.find('form').trigger('submit');
    await flushPromises();
    expect(page.text()).toContain('The date cannot be in the future.');
    expect(wrapper.emitted('refused')).toBeUndefined();
    expect(wrapper.emitted('update:visible')).toBeUndefined();
  });
});
