// @vitest-environment happy-dom
import { mount } from '@vue/test-utils';
import { describe, expect, it } from 'vitest';
import DeckMapList from '@/components/DeckMapList.vue';
import type { DeckConditionEntry } from '@/components/DeckMapFills.vue';
import { compartmentFixture } from './render';

const compartments = [
  compartmentFixture({ id: 11, designation: '1-10-0-L', name: 'Forward berthing' }),
  compartmentFixture({ id: 12, designation: '1-20-0-L', name: 'Galley', accessStatus: 'staff-only', entryCaution: 'Hot surfaces' }),
  compartmentFixture({ id: 13, designation: '1-30-0-L', name: 'Mess deck' }),
];

function buttonFor(wrapper: ReturnType<typeof mount>, name: string) {
  const button = wrapper.findAll('button').find((b) => b.text().includes(name));
  if (!button) throw new Error(`no button for ${name}`);
  return button;
}

describe('DeckMapList', () => {
  it('marks only the selected compartment as current and emits the id of a clicked one', async () => {
    const wrapper = mount(DeckMapList, { props: { compartments, selectedId: 12 } });
    const current = wrapper.findAll('button[aria-current="true"]');
    expect(current).toHaveLength(1);
    expect(current[0]!.text()).toContain('Galley');

    await buttonFor(wrapper, 'Mess deck').trigger('click');
    expect(wrapper.emitted('select')).toEqual([[13]]);

    await wrapper.setProps({ selectedId: 13 });
    expect(buttonFor(wrapper, 'Mess deck').attributes('aria-current')).toBe('true');
    expect(buttonFor(wrapper, 'Galley').attributes('aria-current')).toBeUndefined();
  });

  it('moves the selection with the arrow keys and stops at the ends', async () => {
    const wrapper = mount(DeckMapList, { props: { compartments, selectedId: 11 } });
    await buttonFor(wrapper, 'Forward berthing').trigger('keydown', { key: 'ArrowDown' });
    await buttonFor(wrapper, 'Galley').trigger('keydown', { key: 'ArrowUp' });
    await buttonFor(wrapper, 'Forward berthing').trigger('keydown', { key: 'ArrowUp' });
    await buttonFor(wrapper, 'Mess deck').trigger('keydown', { key: 'ArrowDown' });
    await buttonFor(wrapper, 'Galley').trigger('keydown', { key: 'Enter' });
    expect(wrapper.emitted('select')).toEqual([[12], [11]]);
  });

  it('shows each compartment’s access and caution, and says when the deck has none', async () => {
    const wrapper = mount(DeckMapList, { props: { compartments, selectedId: null } });
    expect(buttonFor(wrapper, 'Galley').text()).toContain('Staff only');
    expect(buttonFor(wrapper, 'Galley').find('[aria-label="Entry caution"]').exists()).toBe(true);
    expect(buttonFor(wrapper, 'Mess deck').find('[aria-label="Entry caution"]').exists()).toBe(false);
    expect(buttonFor(wrapper, 'Mess deck').text()).toContain('not drawn');
    expect(wrapper.text()).not.toContain('No compartments drawn');

    await wrapper.setProps({ compartments: [] });
    expect(wrapper.findAll('button')).toHaveLength(0);
    expect(wrapper.text()).toContain('No compartments drawn on this deck yet.');
  });

  it('shows each compartment’s grade in the condition overlay and its open risks in the risk overlay', async () => {
    const entry = (compartmentId: number, rest: Partial<DeckConditionEntry>): DeckConditionEntry => ({
      compartmentId,
      grade: null,
      reportId: null,
      inspectedOn: null,
      openRisks: 0,
      maxMagnitude: null,
      band: null,
      ...rest,
    });
    const conditions = new Map([
      [11, entry(11, { grade: 'poor', reportId: 4, inspectedOn: '2026-08-06', openRisks: 2, maxMagnitude: 11, band: 'high' })],
      [12, entry(12, { grade: 'good', reportId: 5, inspectedOn: '2026-02-07', openRisks: 1, maxMagnitude: 7, band: 'low' })],
      [13, entry(13, {})],
    ]);
    const wrapper = mount(DeckMapList, { props: { compartments, selectedId: null, overlay: 'condition', conditions } });
    expect(buttonFor(wrapper, 'Forward berthing').find('[data-testid="list-grade"]').text()).toBe('Poor');
    expect(buttonFor(wrapper, 'Galley').find('[data-testid="list-grade"]').text()).toBe('Good');
    expect(buttonFor(wrapper, 'Mess deck').find('[data-testid="list-grade"]').text()).toBe('Not surveyed');
    // The swatch is the outline's fill, hatching and all, not the access border.
    expect(buttonFor(wrapper, 'Forward berthing').find('svg').attributes('data-hatch')).toBe('close');
    expect(buttonFor(wrapper, 'Forward berthing').find('.deck-map-list__swatch').exists()).toBe(false);
    expect(buttonFor(wrapper, 'Galley').text()).toContain('Staff only');

    await wrapper.setProps({ overlay: 'risks' });
    expect(buttonFor(wrapper, 'Forward berthing').find('[data-testid="list-risks"]').text()).toBe('2 open risks, high priority');
    expect(buttonFor(wrapper, 'Galley').find('[data-testid="list-risks"]').text()).toBe('1 open risk, low priority');
    expect(buttonFor(wrapper, 'Mess deck').find('[data-testid="list-risks"]').text()).toBe('No open risks');
    expect(wrapper.find('[data-testid="list-grade"]').exists()).toBe(false);

    // In the access overlay, or while the overlay's data loads, the list shows access only.
    await wrapper.setProps({ overlay: 'access' });
    expect(wrapper.find('[data-testid="list-risks"]').exists()).toBe(false);
    expect(wrapper.findAll('.deck-map-list__swatch')).toHaveLength(3);
    await wrapper.setProps({ overlay: 'condition', conditions: new Map() });
    expect(wrapper.find('[data-testid="list-grade"]').exists()).toBe(false);
    expect(wrapper.findAll('.deck-map-list__swatch')).toHaveLength(3);
  });
});
