import { mount } from '@vue/test-utils';
import { describe, expect, it } from 'vitest';
import { boilingLadder } from '../../shared/calc/boiling-ladder.js';
import VisitBoilingLadder from '../../src/components/visit/VisitBoilingLadder.vue';

describe('the boiling ladder diagram', () => {
  it('draws a rung per stage with its boiling point and the drop from the stage above, as text', () => {
    const result = boilingLadder([
      { name: 'First stage', pressure: 14.7, reading: 'psia' },
      { name: 'Second stage', pressure: 7, reading: 'psia' },
    ]);
    if (!result.ok) throw new Error(result.message);
    const wrapper = mount(VisitBoilingLadder, { props: { stages: result.stages, unit: 'F', title: 'Stages of the plant' } });
    const texts = wrapper.findAll('text').map((t) => t.text());
    // IAPWS-IF97 region 4 (steam tables): 14.7 psia (101.35 kPa) boils at 211.95 °F, 7 psia (48.26 kPa) at about 176.6 °F.
    expect(texts).toEqual(['First stage', '212 °F', 'Second stage', '177 °F', '▼ 35 °F cooler']);
    expect(wrapper.find('svg').attributes('role')).toBe('img');
    expect(wrapper.find('svg').attributes('aria-label')).toMatch(/^Stages of the plant\. The first stage boils at 212 °F\./);
    expect(wrapper.html()).not.toContain('<foreignObject');
  });

  it('keeps a stage name with markup as text', () => {
    const result = boilingLadder([{ name: '<img src=x onerror=alert(1)>', pressure: 100, reading: 'kPa' }]);
    if (!result.ok) throw new Error(result.message);
    const wrapper = mount(VisitBoilingLadder, { props: { stages: result.stages, unit: 'C' } });
    expect(wrapper.find('img').exists()).toBe(false);
    expect(wrapper.findAll('text')[0]?.text()).toBe('<img src=x oner…');
  });
});
