// @vitest-environment happy-dom
import type { Risk } from '@shared/schemas/risks';
import { PiniaColada } from '@pinia/colada';
import { DOMWrapper, flushPromises, mount } from '@vue/test-utils';
import { createPinia } from 'pinia';
import PrimeVue from 'primevue/config';
import { afterEach, describe, expect, it, vi } from 'vitest';
import RiskDialog from '@/components/RiskDialog.vue';

function json(status: number, body: unknown) {
  return new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });
}

function riskFixture(overrides: Partial<Risk> = {}): Risk {
  return {
    id: 9,
    vesselId: 1,
    statement: 'Vandals break gauge glasses in the pump room',
    agent: 'thieves-and-vandals',
    status: 'open',
    a: 4,
    b: 3,
    c: 3,
    yearsBetween: null,
    lossPerItemPercent: null,
    assetFractionPercent: null,
    magnitude: 10,
    band: 'high',
    bandLabel: 'High priority',
    artifacts: [],
    compartments: [],
    notes: '',
    updatedAt: '2026-01-01T00:00:00.000Z',
    version: 2,
    abilities: { update: true, delete: true },
    ...overrides,
  };
}

async function mountDialog(risk: Risk | null) {
  const fetchMock = vi.fn((input: string | URL | Request, init?: RequestInit) => {
    const path = String(input);
    if (path.endsWith('/auth/csrf')) return Promise.resolve(json(200, { csrfToken: 'token' }));
    if (path.includes('/vessels/1/compartments')) return Promise.resolve(json(200, { items: [], total: 0, page: 1, pageSize: 100 }));
    if (path.endsWith('/risks') && init?.method === 'POST') return Promise.resolve(json(201, riskFixture({ ...JSON.parse(String(init.body)), id: 10 })));
    return Promise.reject(new Error(`unexpected request ${path}`));
  });
  vi.stubGlobal('fetch', fetchMock);
  const wrapper = mount(RiskDialog, {
    props: { visible: true, vesselId: 1, risk },
    global: { plugins: [createPinia(), PiniaColada, [PrimeVue, { unstyled: true }]] },
    attachTo: document.body,
  });
  await flushPromises();
  // The dialog is teleported to the body.
  return { wrapper, fetchMock, page: new DOMWrapper(document.body) };
}

const magnitude = (page: DOMWrapper<Element>) => page.find('[role=status]').text();

afterEach(() => {
  vi.unstubAllGlobals();
  document.body.innerHTML = '';
});

describe('RiskDialog', () => {
  it('works each score out from its plain input as it is typed, then MR, its band and what it means', async () => {
    const { page } = await mountDialog(null);
    expect(magnitude(page)).toContain('Give A, B and C to see the magnitude of risk');

    await page.find('input#risk-a-plain').setValue('10');
    expect(page.find('#risk-a-result').text()).toBe('A = 4');
    expect(magnitude(page)).toContain('Give B and C');

    await page.find('input#risk-b-plain').setValue('100');
    await page.find('input#risk-c-plain').setValue('1');
    expect(page.find('#risk-b-result').text()).toBe('B = 5');
    expect(page.find('#risk-c-result').text()).toBe('C = 3');
    expect(magnitude(page)).toContain('MR 12');
    expect(magnitude(page)).toContain('= A 4 + B 5 + C 3');
    expect(magnitude(page)).toContain('Very high priority');
    expect(magnitude(page)).toContain('MR 11.5–13');
    expect(magnitude(page)).toContain('Significant loss to much of the heritage value');

    // Ten times rarer is one point less.
    await page.find('input#risk-a-plain').setValue('100');
    expect(page.find('#risk-a-result').text()).toBe('A = 3');
    expect(magnitude(page)).toContain('MR 11');
    expect(magnitude(page)).toContain('High priority');
  });

  it('shows why a plain input gives no score, and no MR until it does', async () => {
    const { page } = await mountDialog(null);
    await page.find('input#risk-b-plain').setValue('100');
    await page.find('input#risk-c-plain').setValue('1');

    await page.find('input#risk-a-plain').setValue('0');
    expect(page.find('#risk-a-result').text()).toBe('Years between events must be more than 0.');
    expect(magnitude(page)).toContain('Give A to see the magnitude');

    await page.find('input#risk-a-plain').setValue('often');
    expect(page.find('#risk-a-result').text()).toBe('Enter a number.');

    await page.find('input#risk-b-plain').setValue('150');
    expect(page.find('#risk-b-result').text()).toBe('Loss of value to each affected item must be more than 0 and at most 100 %.');
  });

  it('starts from the scores of a risk given directly, and follows a switch to the plain input', async () => {
    const { page } = await mountDialog(riskFixture());
    expect(page.find('#risk-a-result').text()).toBe('A = 4');
    expect(magnitude(page)).toContain('MR 10');
    expect(magnitude(page)).toContain('High priority');
    expect(magnitude(page)).toContain('MR 9.5–11');

    await page.find('input#risk-a-mode-plain').setValue(true);
    expect(magnitude(page)).toContain('Give A');
    await page.find('input#risk-a-plain').setValue('1');
    expect(page.find('#risk-a-result').text()).toBe('A = 5');
    expect(magnitude(page)).toContain('MR 11');
  });

  it('sends each plain input in place of its score', async () => {
    const { wrapper, fetchMock, page } = await mountDialog(null);
    await page.find('textarea#risk-statement').setValue('Vandals break gauge glasses in the pump room');
    await page.find('input#risk-a-plain').setValue('10');
    await page.find('input#risk-b-plain').setValue('100');
    await page.find('input#risk-c-plain').setValue('1');

    await page.find('form').trigger('submit');
    await flushPromises();
    expect(page.text()).toContain('Choose the agent of deterioration.');
    expect(fetchMock.mock.calls.some(([input]) => String(input).endsWith('/risks'))).toBe(false);

    // The agent is the one Select while every score is given by its plain input.
    wrapper.findComponent({ name: 'Select' }).vm.$emit('update:modelValue', 'thieves-and-vandals');
    await flushPromises();
    await page.find('form').trigger('submit');
    await flushPromises();
    const [, init] = fetchMock.mock.calls.find(([input]) => String(input).endsWith('/risks'))!;
    expect(JSON.parse(String(init!.body))).toMatchObject({ agent: 'thieves-and-vandals', a: null, yearsBetween: 10, b: null, lossPerItemPercent: 100, c: null, assetFractionPercent: 1 });
    expect(wrapper.emitted('saved')?.[0]?.[1]).toBe(true);
  });
});
