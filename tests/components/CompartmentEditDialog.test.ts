// @vitest-environment happy-dom
import type { Deck } from '@shared/schemas/decks';
import { PiniaColada } from '@pinia/colada';
import { DOMWrapper, flushPromises, mount } from '@vue/test-utils';
import { createPinia } from 'pinia';
import PrimeVue from 'primevue/config';
import { afterEach, describe, expect, it, vi } from 'vitest';
import CompartmentEditDialog from '@/components/CompartmentEditDialog.vue';

function json(status: number, body: unknown) {
  return new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });
}

// 0.03048 m per plan unit, frame 0 at x 3000 with the bow to the right, 20 units a frame, last frame 140.
const deck: Deck = {
  id: 4,
  vesselId: 1,
  name: 'Second deck',
  position: 1,
  levelCode: '2',
  calibration: { metresPerUnit: 0.03048, method: 'frames', a: [2800, 500], b: [800, 500], realMetres: 60.96, frameSpaces: 100, frameSpacingMetres: 0.6096 },
  centerlineY: 500,
  frames: { referenceFrame: 0, referenceX: 3000, spacingMetres: 0.6096, lastFrame: 140 },
  bowTo: 'right',
  compartmentCount: 0,
  version: 3,
  abilities: { update: true, delete: false },
};
/** Frames 40–60, below the centerline: to starboard. */
const outline: [number, number][] = [[2200, 520], [1800, 520], [1800, 650], [2200, 650]];

async function mountDialog() {
  const fetchMock = vi.fn((input: string | URL | Request, init?: RequestInit) => {
    const path = String(input);
    if (path.endsWith('/auth/csrf')) return Promise.resolve(json(200, { csrfToken: 'token' }));
    if (path.endsWith('/vessels/1/decks')) return Promise.resolve(json(200, [deck]));
    if (path.endsWith('/vessels/1/compartments') && init?.method === 'POST') return Promise.resolve(json(201, { id: 1 }));
    return Promise.reject(new Error(`unexpected request ${path}`));
  });
  vi.stubGlobal('fetch', fetchMock);
  const wrapper = mount(CompartmentEditDialog, {
    props: { visible: true, compartment: null, vesselId: 1, scheme: 'us-navy-1949', deckId: 4, outline, planSize: { width: 3200, height: 1000 } },
    global: { plugins: [createPinia(), PiniaColada, [PrimeVue, { unstyled: true }]] },
    attachTo: document.body,
  });
  await flushPromises();
  return { wrapper, fetchMock, page: new DOMWrapper(document.body) };
}

afterEach(() => {
  vi.unstubAllGlobals();
  document.body.innerHTML = '';
});

describe('CompartmentEditDialog designation hints', () => {
  it('checks deck, side and frames while typing, suggests from the drawing, and explains the use letters', async () => {
    const { page } = await mountDialog();
    const input = page.find<HTMLInputElement>('#compartment-designation');
    // Before anything is typed, the drawing already gives deck, frame and side.
    expect(page.find('.compartment-dialog__suggestion').text()).toContain('2-40-1-');

    await input.setValue('3-70-2-E');
    const checks = page.find('#compartment-designation-checks').text();
    expect(checks).toContain('The designation says third deck, but the compartment is on Second deck (deck 2).');
    expect(checks).toContain('An even position means a compartment to port, but the outline reaches to starboard of the centerline.');
    expect(checks).toContain('The designation says frame 70, but the outline spans frames 40–60; designations use the foremost, 40.');

    const use = page.findAll('button').find((b) => b.text().includes('Use suggestion'))!;
    await use.trigger('click');
    expect(input.element.value).toBe('2-40-1-E');
    expect(page.find('#compartment-designation-checks').text()).toBe('');

    const legend = page.find('.use-letters');
    expect(legend.text()).toContain('engineering space');
    expect(legend.find('.use-letters__row--typed').text()).toBe('Eengineering space');
  });

  it('shows a frame beyond the plan’s last frame as an error and does not send it', async () => {
    const { page, fetchMock } = await mountDialog();
    await page.find('#compartment-designation').setValue('2-150-1-E');
    await page.find('#compartment-name').setValue('Shaft alley');
    expect(page.find('#compartment-designation-checks').text()).toContain("Frame 150 is beyond the last frame of Second deck's plan (frame 140).");
    await page.find('form').trigger('submit');
    await flushPromises();
    expect(fetchMock.mock.calls.some(([, init]) => init?.method === 'POST')).toBe(false);
    expect(page.find('#compartment-designation-error').text()).toBe("Frame 150 is beyond the last frame of Second deck's plan (frame 140).");
  });
});

describe('CompartmentFramesDialog', () => {
  it('numbers the frames from the forward end of the outline, the spacing in feet and inches and the last frame', async () => {
    const { default: CompartmentFramesDialog } = await import('@/components/CompartmentFramesDialog.vue');
    const sent: unknown[] = [];
    vi.stubGlobal(
      'fetch',
      vi.fn((input: string | URL | Request, init?: RequestInit) => {
        const path = String(input);
        if (path.endsWith('/auth/csrf')) return Promise.resolve(json(200, { csrfToken: 'token' }));
        if (path.endsWith('/decks/4') && init?.method === 'PATCH') {
          sent.push(JSON.parse(String(init.body)));
          return Promise.resolve(json(200, deck));
        }
        return Promise.reject(new Error(`unexpected request ${path}`));
      }),
    );
    mount(CompartmentFramesDialog, {
      props: { visible: true, deck: { ...deck, frames: null }, outline, units: 'us-customary' },
      global: { plugins: [createPinia(), PiniaColada, [PrimeVue, { unstyled: true }]] },
      attachTo: document.body,
    });
    await flushPromises();
    const page = new DOMWrapper(document.body);
    // The spacing comes from the calibration, 0.6096 m, written as 2 ft.
    expect(page.find<HTMLInputElement>('#frames-spacing').element.value).toBe("2'");
    await page.find('form').trigger('submit');
    await flushPromises();
    expect(page.text()).toContain('Give the frame at the forward end of the outline.');
    expect(sent).toEqual([]);

    const forward = page.find<HTMLInputElement>('#frames-forward');
    await forward.setValue('40');
    await forward.trigger('input');
    await forward.trigger('blur');
    const last = page.find<HTMLInputElement>('#frames-last');
    await last.setValue('140');
    await last.trigger('input');
    await last.trigger('blur');
    await page.find('form').trigger('submit');
    await flushPromises();
    // Bow to the right: the forward end is the outline's largest x, 2200.
    expect(sent).toEqual([{ frames: { referenceFrame: 40, referenceX: 2200, spacingMetres: 0.6096, lastFrame: 140 }, version: 3 }]);
  });
});
