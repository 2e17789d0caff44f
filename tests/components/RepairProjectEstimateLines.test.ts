// @vitest-environment happy-dom
import { PiniaColada } from '@pinia/colada';
import { flushPromises, mount } from '@vue/test-utils';
import { createPinia } from 'pinia';
import PrimeVue from 'primevue/config';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { defineComponent, h, ref } from 'vue';
import RepairProjectEstimateLines from '@/components/RepairProjectEstimateLines.vue';
import { blankRow, readEstimate, type EstimateRow } from '@/utils/estimate-form';

function json(status: number, body: unknown) {
  return new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });
}

async function mountLines(errors: Record<string, string> = {}) {
  vi.stubGlobal('fetch', vi.fn((input: string | URL | Request) => (String(input).endsWith('/settings') ? Promise.resolve(json(200, { currency: 'USD' })) : Promise.reject(new Error(`unexpected ${String(input)}`)))));
  const rows = ref<EstimateRow[]>([blankRow()]);
  const contingency = ref('10');
  const Host = defineComponent(() => () => h(RepairProjectEstimateLines, { idPrefix: 't', errors, rows: rows.value, 'onUpdate:rows': (v: EstimateRow[]) => (rows.value = v), contingency: contingency.value, 'onUpdate:contingency': (v: string) => (contingency.value = v) }));
  const wrapper = mount(Host, { global: { plugins: [createPinia(), PiniaColada, [PrimeVue, { unstyled: true }]] } });
  await flushPromises();
  return { wrapper, rows, contingency };
}

afterEach(() => vi.unstubAllGlobals());

describe('RepairProjectEstimateLines', () => {
  it('works out line totals, the contingency and the total as lines are typed', async () => {
    const { wrapper } = await mountLines();
    await wrapper.find('[aria-label="Line 1 description"]').setValue('Deckhead plate');
    await wrapper.find('[aria-label="Line 1 quantity"]').setValue('12.5');
    await wrapper.find('[aria-label="Line 1 unit cost"]').setValue('84.37');
    const addLine = wrapper.findAll('button').find((b) => b.text().includes('Add a line'))!;
    await addLine.trigger('click');
    await wrapper.find('[aria-label="Line 2 quantity"]').setValue('3');
    await wrapper.find('[aria-label="Line 2 unit cost"]').setValue('65');
    // By hand: 12.5 × 84.37 = 1,054.625 → 1,054.63; 3 × 65.00 = 195.00; subtotal 1,249.63; 10 % = 124.963 → 124.96; total 1,374.59
    const text = wrapper.text();
    expect(text).toContain('$1,054.63');
    expect(text).toContain('$195.00');
    expect(text).toContain('$1,249.63');
    expect(text).toContain('$124.96');
    expect(text).toContain('$1,374.59');
    // A quantity that is not a plain decimal gives no total for its line.
    await wrapper.find('[aria-label="Line 2 quantity"]').setValue('3,5');
    expect(wrapper.findAll('tbody tr')[1]!.text()).toContain('—');
  });

  it('shows the server’s complaint beside the line it names', async () => {
    const { wrapper } = await mountLines({ 'lines.0.unitCostCents': 'Unit cost may not be negative.', contingencyBasisPoints: 'Contingency must be at most 100 %.' });
    expect(wrapper.findAll('tbody tr')[0]!.text()).toContain('Unit cost may not be negative.');
    expect(wrapper.find('tfoot').text()).toContain('Contingency must be at most 100 %.');
  });
});

describe('readEstimate', () => {
  it('reads what people type into integers without floats, naming what it cannot read', () => {
    const read = readEstimate([{ key: 1, description: 'Primer', quantity: '0.333', unit: 'kg', unitCost: '29.99' }, { key: 2, description: 'x', quantity: '1.2345', unit: 'h', unitCost: '1.005' }], '12.5');
    expect(read.lines[0]).toEqual({ description: 'Primer', quantityMilli: 333, unit: 'kg', unitCostCents: 2999 });
    expect(read.contingencyBasisPoints).toBe(1250);
    expect(read.problems).toEqual({ 'lines.1.quantityMilli': 'Enter a quantity such as 2.5 (at most three decimals).', 'lines.1.unitCostCents': 'Enter a cost such as 84.37 (at most two decimals).' });
  });
});
