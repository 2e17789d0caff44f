// @vitest-environment happy-dom
import { mount } from '@vue/test-utils';
import PrimeVue from 'primevue/config';
import { describe, expect, it } from 'vitest';
import CompartmentDesignation from '@/components/CompartmentDesignation.vue';
import { compartmentFixture } from './render';

describe('CompartmentDesignation', () => {
  it('shows the explanation in words and each warning, and nothing when there is neither', async () => {
    const explanation = 'Main deck, frame 50, on the centreline, a living space.';
    const warning = 'The last part "Q" is not a known compartment use.';
    const wrapper = mount(CompartmentDesignation, {
      props: { compartment: compartmentFixture({ designationExplanation: explanation, designationWarnings: [warning] }) },
      global: { plugins: [[PrimeVue, { unstyled: true }]] },
    });
    expect(wrapper.find('p').text()).toBe(explanation);
    expect(wrapper.text()).toContain(warning);

    await wrapper.setProps({ compartment: compartmentFixture() });
    expect(wrapper.find('p').exists()).toBe(false);
    expect(wrapper.text()).toBe('');
  });
});
