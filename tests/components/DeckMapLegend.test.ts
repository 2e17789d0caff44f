// @vitest-environment happy-dom
import { bandRange, PRIORITY_BANDS, PRIORITY_LABELS } from '@shared/calc/abc-risk';
import { GRADE_LABELS, GRADES } from '@shared/calc/condition-grade';
import { mount } from '@vue/test-utils';
import { describe, expect, it } from 'vitest';
import DeckMapLegend from '@/components/DeckMapLegend.vue';

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

  it('keeps the access key, by border pattern, when the outlines show access', () => {
    const wrapper = mount(DeckMapLegend, { props: { overlay: 'access' } });
    expect(keyItems(wrapper)).toHaveLength(0);
    expect(wrapper.text()).toContain('Guided only');
    expect(wrapper.text()).toContain('long dashes');
  });
});
