// @vitest-environment happy-dom
import type { InterpretationRevision } from '@shared/schemas/interpretation';
import type { RichTextDoc } from '@shared/schemas/rich-text';
import { PiniaColada } from '@pinia/colada';
import { DOMWrapper, flushPromises, mount, type VueWrapper } from '@vue/test-utils';
import { createPinia } from 'pinia';
import PrimeVue from 'primevue/config';
import ConfirmationService from 'primevue/confirmationservice';
import ConfirmDialog from 'primevue/confirmdialog';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { defineComponent, h, ref } from 'vue';
import InterpretationRevisions from '@/components/InterpretationRevisions.vue';

const doc = (text: string): RichTextDoc => ({ type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text }] }] });
const part = (text: string) => ({ doc: doc(text), html: `<p>${text}</p>`, text });
const revision = (number: number, label: string, story: string | null): InterpretationRevision => ({
  number,
  savedAt: `2026-11-0${number}T10:00:00.000Z`,
  savedBy: { id: 4, name: 'Walt Dunmore' },
  texts: { general: { label: part(label), story: story ? part(story) : null }, families: null, technical: null },
});
let mounted: VueWrapper | null = null;
const REVISIONS = [revision(3, 'The lamp of the wheelhouse.', 'Lit every night.'), revision(2, 'The lamp of the chartroom.', 'Lit every night.'), revision(1, 'The lamp of the chartroom.', null)];

function json(status: number, body: unknown) {
  return new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });
}
async function frames() {
  await new Promise((resolve) => requestAnimationFrame(() => requestAnimationFrame(resolve)));
  await flushPromises();
}

async function mountDialog(onRestore: (path: string, body: Record<string, unknown>) => Response, dirty = false) {
  const restored: unknown[] = [];
  vi.stubGlobal(
    'fetch',
    vi.fn((input: string | URL | Request, init?: RequestInit) => {
      const path = String(input);
      if (path.endsWith('/auth/csrf')) return Promise.resolve(json(200, { csrfToken: 'token' }));
      if (path.endsWith('/artifacts/6/interpretation/revisions')) return Promise.resolve(json(200, REVISIONS));
      if (path.includes('/restore') && init?.method === 'POST') return Promise.resolve(onRestore(path, JSON.parse(String(init.body))));
      return Promise.reject(new Error(`unexpected request ${path}`));
    }),
  );
  const Host = defineComponent(() => {
    const visible = ref(true);
    return () => [
      h(ConfirmDialog),
      h(InterpretationRevisions, {
        visible: visible.value,
        'onUpdate:visible': (v: boolean) => (visible.value = v),
        subjectType: 'artifact',
        subjectId: 6,
        subjectLabel: '2026.4.1 Lamp',
        version: 5,
        canRestore: true,
        dirty,
        onRestored: (record: unknown) => restored.push(record),
      }),
    ];
  });
  mounted = mount(Host, { global: { plugins: [createPinia(), PiniaColada, [PrimeVue, { unstyled: true }], ConfirmationService] }, attachTo: document.body });
  await flushPromises();
  await frames();
  return { restored, page: new DOMWrapper(document.body) };
}

const button = (page: DOMWrapper<Element>, name: string) => page.findAll('button').find((b) => b.text().trim() === name);

afterEach(() => {
  mounted?.unmount();
  mounted = null;
  vi.unstubAllGlobals();
  document.body.innerHTML = '';
});

describe('InterpretationRevisions', () => {
  it('puts two ticked revisions side by side and marks only the parts that differ', async () => {
    const { page } = await mountDialog(() => json(500, {}));
    expect(button(page, 'Compare side by side')!.attributes('disabled')).toBeDefined();
    await page.get('input[aria-label="Compare revision 3"]').setValue(true);
    await page.get('input[aria-label="Compare revision 1"]').setValue(true);
    await button(page, 'Compare side by side')!.trigger('click');
    await frames();
    const compare = page.get('section[aria-label="Revision 1 and revision 3"]');
    expect(compare.text()).toContain('2 parts differ, marked.');
    const changed = compare.findAll('.interpretation-revisions__row--changed').map((row) => row.get('h4').text());
    expect(changed).toEqual(['General labelchanged', 'General storyadded']);
    expect(compare.get('[aria-label="Revision 1: General label"]').text()).toBe('The lamp of the chartroom.');
    expect(compare.get('[aria-label="Revision 3: General label"]').text()).toBe('The lamp of the wheelhouse.');
    expect(compare.get('[aria-label="Revision 1: General story"]').text()).toBe('—');
  });

  it('restores the chosen revision only after confirmation, with the version the editor holds', async () => {
    const calls: { path: string; body: Record<string, unknown> }[] = [];
    const { page, restored } = await mountDialog((path, body) => {
      calls.push({ path, body });
      return json(200, { subjectLabel: '2026.4.1 Lamp', revisions: 4, version: 6 });
    }, true);
    // The newest revision is the draft itself: nothing to restore.
    expect(page.findAll('button').some((b) => b.text().startsWith('Restore revision'))).toBe(false);
    await page.findAll('button').find((b) => b.text().startsWith('Revision 2'))!.trigger('click');
    await button(page, 'Restore revision 2')!.trigger('click');
    await frames();
    expect(page.text()).toContain('Restore revision 2?');
    expect(page.text()).toContain('Your unsaved changes in the editor will be lost.');
    await button(page, 'Cancel')!.trigger('click');
    await frames();
    expect(calls).toHaveLength(0);

    await button(page, 'Restore revision 2')!.trigger('click');
    await frames();
    await button(page, 'Restore')!.trigger('click');
    await frames();
    expect(calls).toEqual([{ path: expect.stringMatching(/\/api\/v1\/artifacts\/6\/interpretation\/revisions\/2\/restore$/), body: { version: 5 } }]);
    expect(restored).toHaveLength(1);
  });

  it('shows why a restore was refused', async () => {
    const { page, restored } = await mountDialog(() => json(409, { error: { code: 'conflict', message: 'Someone else changed this interpretation since you opened it. Reload to see their changes.', fields: { version: 'current version is 6' } } }));
    await page.findAll('button').find((b) => b.text().startsWith('Revision 1'))!.trigger('click');
    await button(page, 'Restore revision 1')!.trigger('click');
    await frames();
    await button(page, 'Restore')!.trigger('click');
    await frames();
    expect(page.get('[role=alert]').text()).toContain('Someone else changed this interpretation since you opened it.');
    expect(restored).toHaveLength(0);
  });
});
