// @vitest-environment happy-dom
import { bandRange, DEFAULT_RISK_SCALE, PRIORITY_BANDS, PRIORITY_LABELS, type RiskScale } from '@shared/calc/abc-risk';
import { GRADE_LABELS, GRADES } from '@shared/calc/condition-grade';
import { PiniaColada } from '@pinia/colada';
import { flushPromises, mount as mountWith } from '@vue/test-utils';
import { createPinia } from 'pinia';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import DeckMapLegend from '@/components/DeckMapLegend.vue';

/** The organisation's risk scale the settings answer with. */
let riskScale: RiskScale = DEFAULT_RISK_SCALE;
beforeEach(() => {
  riskScale = DEFAULT_RISK_SCALE;
  vi.stubGlobal(
    'fetch',
    vi.fn((input: string | URL | Request) =>
      String(input).endsWith('/settings')
        ? Promise.resolve(new Response(JSON.stringify({ unitSystem: 'metric', riskScale }), { status: 200, headers: { 'content-type': 'application/json' } }))
        : Promise.reject(new Error(`unexpected request ${String(input)}`)),
    ),
  );
});
afterEach(() => vi.unstubAllGlobals());

const mount = (component: typeof DeckMapLegend, options: { props: Record<string, unknown> }) => mountWith(component, { ...options, global: { plugins: [createPinia(), PiniaColada] } });

function keyItems(wrapper: ReturnType<typeof mount>) {
  return wrapper.findAll('li[data-fill]');
}

describe('DeckMapLegend', () => {
  it('explains each condition grade by a hatching of its own as well as its colour, and names the hatching in words', () => {
    const wrapper = mount(DeckMapLegend, { props: { overlay: 'condition' } });
    const items = keyItems(wrapper);
    expect(items.map((li) => li.text().split(' (')[0])).toEqual([...[...GRADES].reverse().map((g) => GRADE_LABELS[g]), 'Not surveyed']);

    const hatches = items.map((li) => li.find('svg').attributes('data-hatch'));
    expect(new Set(hatches).size).toBe(items.length);
    // The swatch is filled with its pattern, and the pattern is drawn inside the legend itself.
    for (const li of items) {
      const fill = li.find('svg > rect').attributes('fill');
      const id = /^url\(#(.+)\)$/.exec(fill ?? '')?.[1];
      expect(id).toBeTruthy();
      expect(li.find('pattern').attributes('id')).toBe(id);
    }
    expect(items[0]!.find('.sk-visually-hidden').text()).toContain('cross-hatching');
    expect(items[4]!.find('.sk-visually-hidden').text()).toContain('grey dots');

    expect(wrapper.text()).toContain('latest submitted condition report');
    expect(wrapper.text()).toContain("date is on the compartment's card");
    // The label shown on the outlines, as a sample.
    expect(wrapper.find('.deck-map-legend__note .deck-map-label').text()).toBe('Poor');
    expect(wrapper.text()).not.toContain('Guided only');
  });

  it('lists the risk bands with their MR ranges, each with its own hatching and a gauge that rises with the band', () => {
    const wrapper = mount(DeckMapLegend, { props: { overlay: 'risks', centerline: true } });
    const items = keyItems(wrapper);
    expect(items).toHaveLength(PRIORITY_BANDS.length + 1);
    PRIORITY_BANDS.forEach((band, i) => {
      expect(items[i]!.text()).toContain(PRIORITY_LABELS[band]);
      expect(items[i]!.text()).toContain(bandRange(band));
      expect(items[i]!.findAll('.deck-map-label__step--on')).toHaveLength(PRIORITY_BANDS.length - i);
      expect(items[i]!.find('.sk-visually-hidden').text()).toContain(`gauge ${PRIORITY_BANDS.length - i} of 5`);
    });
    expect(items.at(-1)!.text()).toContain('No open risks');
    expect(new Set(items.map((li) => li.find('svg').attributes('data-hatch'))).size).toBe(items.length);
    expect(wrapper.text()).toContain('counts the open risks');
    expect(wrapper.text()).toContain('Centerline');
  });

  it('gives the bands the ranges of the organisation’s risk scale once the settings are in', async () => {
    riskScale = { ...DEFAULT_RISK_SCALE, bandFloors: { low: 4, medium: 8, high: 10, 'very-high': 12, extreme: 14 } };
    const wrapper = mount(DeckMapLegend, { props: { overlay: 'risks' } });
    await flushPromises();
    const items = keyItems(wrapper);
    expect(items[0]!.text()).toContain('MR 14–15');
    expect(items[1]!.text()).toContain('MR 12–13.5');
    expect(items[2]!.text()).toContain('MR 10–11.5');
    expect(items[3]!.text()).toContain('MR 8–9.5');
    expect(items[4]!.text()).toContain('MR 4–7.5');
    PRIORITY_BANDS.forEach((band, i) => expect(items[i]!.text()).toContain(bandRange(band, riskScale)));
    expect(items[4]!.text()).not.toContain(bandRange('low'));
  });

  it('keeps the access key, by border pattern, when the outlines show access', () => {
    const wrapper = mount(DeckMapLegend, { props: { overlay: 'access' } });
    expect(keyItems(wrapper)).toHaveLength(0);
    expect(wrapper.text()).toContain('Guided only');
    expect(wrapper.text()).toContain('long dashes');
  });
});
