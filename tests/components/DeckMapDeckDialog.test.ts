// @vitest-environment happy-dom
import type { Deck } from '@shared/schemas/decks';
import { PiniaColada } from '@pinia/colada';
import { DOMWrapper, flushPromises, mount } from '@vue/test-utils';
import { createPinia } from 'pinia';
import PrimeVue from 'primevue/config';
import ConfirmationService from 'primevue/confirmationservice';
import { afterEach, describe, expect, it, vi } from 'vitest';
import DeckMapDeckDialog from '@/components/DeckMapDeckDialog.vue';

function json(status: number, body: unknown) {
  return new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });
}

// 0.01 m per plan unit with the bow to the right: frames 0.6 m apart are 60 units apart.
const numbered: Deck = {
  id: 4,
  vesselId: 1,
  name: 'Second deck',
  position: 1,
  levelCode: '2',
  calibration: { metresPerUnit: 0.01, method: 'points', a: [100, 500], b: [1100, 500], realMetres: 10 },
  centerlineY: 500,
  frames: { referenceFrame: 10, referenceX: 2900, spacingMetres: 0.6, lastFrame: 50 },
  bowTo: 'right',
  compartmentCount: 0,
  version: 3,
  abilities: { update: true, delete: false },
};

async function mountDialog(deck: Deck) {
  const patches: unknown[] = [];
  vi.stubGlobal(
    'fetch',
    vi.fn((input: string | URL | Request, init?: RequestInit) => {
      const path = String(input);
      if (path.endsWith('/auth/csrf')) return Promise.resolve(json(200, { csrfToken: 'token' }));
      if (path.endsWith('/settings')) return Promise.resolve(json(200, { unitSystem: 'metric' }));
      if (path.endsWith(`/decks/${deck.id}`) && init?.method === 'PATCH') {
        patches.push(JSON.parse(String(init.body)));
        return Promise.resolve(json(200, { ...deck, version: deck.version + 1 }));
      }
      return Promise.reject(new Error(`unexpected request ${path}`));
    }),
  );
  const wrapper = mount(DeckMapDeckDialog, {
    props: { visible: false, deck, vesselId: 1, planWidth: 3000, planHeight: 1000, deckCount: 4 },
    global: { plugins: [createPinia(), PiniaColada, [PrimeVue, { unstyled: true }], ConfirmationService] },
    attachTo: document.body,
  });
  await flushPromises();
  // Opened once the settings (metric) are in, as on the map.
  await wrapper.setProps({ visible: true });
  await flushPromises();
  return { wrapper, patches, page: new DOMWrapper(document.body) };
}

async function type(page: DOMWrapper<Element>, selector: string, value: string) {
  const input = page.find<HTMLInputElement>(selector);
  input.element.value = value;
  await input.trigger('input');
  await input.trigger('blur');
}

async function save(page: DOMWrapper<Element>) {
  await page.find('form#deck-form').trigger('submit');
  await flushPromises();
}

afterEach(() => {
  vi.unstubAllGlobals();
  document.body.innerHTML = '';
});

describe('DeckMapDeckDialog frame numbers', () => {
  it('shows the deck’s frames and saves a change, the spacing as stored', async () => {
    const { page, patches } = await mountDialog(numbered);
    expect(page.find<HTMLInputElement>('#deck-frames-reference').element.value).toBe('10');
    expect(page.find<HTMLInputElement>('#deck-frames-x').element.value).toBe('2900');
    expect(page.find<HTMLInputElement>('#deck-frames-spacing').element.value).toBe('0.6');
    expect(page.find<HTMLInputElement>('#deck-frames-last').element.value).toBe('50');
    expect(page.text()).toContain('the plan is 3000 wide');

    await type(page, '#deck-frames-last', '45');
    await save(page);
    expect(patches).toHaveLength(1);
    expect(patches[0]).toMatchObject({ frames: { referenceFrame: 10, referenceX: 2900, spacingMetres: 0.6, lastFrame: 45 }, version: 3 });
  });

  it('explains what is missing or wrong, beside each field, and sends nothing', async () => {
    const { page, patches } = await mountDialog(numbered);
    await type(page, '#deck-frames-spacing', 'two feet');
    await type(page, '#deck-frames-x', '3200');
    await type(page, '#deck-frames-last', '5');
    await save(page);
    expect(patches).toHaveLength(0);
    expect(page.text()).toContain('Some fields need attention.');
    expect(page.text()).toContain('Write the frame spacing in metres, e.g. 0.61.');
    expect(page.text()).toContain('The plan is 3000 pixels wide: the frame must lie on it.');
    expect(page.text()).toContain('The last frame cannot be forward of the reference frame.');

    const reference = page.find<HTMLInputElement>('#deck-frames-reference');
    reference.element.value = '';
    await reference.trigger('input');
    await reference.trigger('blur');
    await save(page);
    expect(page.text()).toContain('Give the number of a frame you can find on the plan.');
    expect(patches).toHaveLength(0);
  });

  it('warns when the last frame would fall beyond the plan at this spacing', async () => {
    const { page } = await mountDialog(numbered);
    expect(page.find('[data-testid="deck-frames-warning"]').exists()).toBe(false);
    // 60 units a frame aft (to the left) of x 2900: frame 60 stands at x -100.
    await type(page, '#deck-frames-last', '60');
    expect(page.find('[data-testid="deck-frames-warning"]').text()).toContain("frame 60 would lie 100 pixels beyond the plan's left edge");
  });

  it('stops numbering the frames when switched off, and sends no frames for a deck never numbered', async () => {
    const first = await mountDialog(numbered);
    await first.page.find('#deck-frames-numbered').trigger('change');
    expect(first.page.find('#deck-frames-reference').exists()).toBe(false);
    await save(first.page);
    expect(first.patches[0]).toMatchObject({ frames: null });
    first.wrapper.unmount();
    document.body.innerHTML = '';

    const second = await mountDialog({ ...numbered, frames: null, calibration: null });
    expect(second.page.find('#deck-frames-reference').exists()).toBe(false);
    await save(second.page);
    expect(second.patches).toHaveLength(1);
    expect(second.patches[0]).not.toHaveProperty('frames');
  });
});
