// @vitest-environment happy-dom
import type { Interpretation } from '@shared/schemas/interpretation';
import type { RichTextDoc } from '@shared/schemas/rich-text';
import { PiniaColada } from '@pinia/colada';
import { DOMWrapper, flushPromises, mount } from '@vue/test-utils';
import { createPinia } from 'pinia';
import PrimeVue from 'primevue/config';
import ConfirmationService from 'primevue/confirmationservice';
import ToastService from 'primevue/toastservice';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { nextTick } from 'vue';
import InterpretationPanel from '@/components/InterpretationPanel.vue';

const doc = (text: string): RichTextDoc => ({ type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text }] }] });
const part = (text: string) => ({ doc: doc(text), html: `<p>${text}</p>`, text });

function fixture(overrides: Partial<Interpretation> = {}): Interpretation {
  return {
    subjectType: 'artifact',
    subjectId: 6,
    vesselId: 1,
    subjectLabel: '1998.1.6 Scotch marine boiler (port)',
    state: 'draft',
    draft: { general: { label: part('The new draft label.'), story: null }, families: null, technical: null },
    published: { general: { label: part('The published label visitors read.'), story: null }, families: null, technical: null },
    differsFromPublished: true,
    publishedAt: '2026-11-01T10:00:00.000Z',
    publishedBy: { id: 2, name: 'Tomasz Ellery' },
    submittedAt: null,
    submittedBy: null,
    lastEditedBy: { id: 4, name: 'Walt Dunmore' },
    returnComment: null,
    returnedBy: null,
    returnedAt: null,
    revisions: 2,
    targets: { labelMaxWords: 75, maxGrade: { general: 8, families: 8, technical: null } },
    updatedAt: '2026-11-02T10:00:00.000Z',
    version: 3,
    abilities: { update: true, submit: true, approve: false, return: false },
    ...overrides,
  };
}

function json(status: number, body: unknown) {
  return new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });
}

async function frames() {
  await new Promise((resolve) => requestAnimationFrame(() => requestAnimationFrame(resolve)));
  await flushPromises();
}

async function mountPanel(record: Interpretation, onPut: (body: Record<string, unknown>) => Response) {
  const puts: Record<string, unknown>[] = [];
  vi.stubGlobal(
    'fetch',
    vi.fn((input: string | URL | Request, init?: RequestInit) => {
      const path = String(input);
      if (path.endsWith('/auth/csrf')) return Promise.resolve(json(200, { csrfToken: 'token' }));
      if (path.endsWith('/artifacts/6/interpretation') && init?.method === 'PUT') {
        const body = JSON.parse(String(init.body));
        puts.push(body);
        return Promise.resolve(onPut(body));
      }
      if (path.endsWith('/artifacts/6/interpretation')) return Promise.resolve(json(200, record));
      return Promise.reject(new Error(`unexpected request ${path}`));
    }),
  );
  const wrapper = mount(InterpretationPanel, {
    props: { subjectType: 'artifact', subjectId: 6 },
    global: { plugins: [createPinia(), PiniaColada, [PrimeVue, { unstyled: true }], ToastService, ConfirmationService] },
    attachTo: document.body,
  });
  await flushPromises();
  await frames();
  return { wrapper, puts, page: new DOMWrapper(document.body) };
}

async function type(page: DOMWrapper<Element>, label: string, text: string) {
  const area = page.get<HTMLElement>(`[role=textbox][aria-label="${label}"]`).element;
  const paragraph = area.querySelector('p')!;
  paragraph.textContent = (paragraph.textContent ?? '') + text;
  await new Promise((resolve) => setTimeout(resolve, 20));
  await frames();
}

const button = (page: DOMWrapper<Element>, name: string) => page.findAll('button').find((b) => b.text().trim() === name)!;

afterEach(() => {
  vi.unstubAllGlobals();
  document.body.innerHTML = '';
});

describe('InterpretationPanel', () => {
  it('shows the published version beside a draft that differs, and needs a save before submitting', async () => {
    const { page, puts } = await mountPanel(fixture(), () => json(200, fixture({ version: 4, draft: { general: { label: part('The new draft label. Longer.'), story: null }, families: null, technical: null } })));
    expect(page.get('aside[aria-label="Published general text"]').text()).toContain('The published label visitors read.');
    expect(page.text()).toContain('Published version differs');
    expect(button(page, 'Save draft').attributes('disabled')).toBeDefined();
    expect(button(page, 'Submit for review').attributes('disabled')).toBeUndefined();

    await type(page, 'General label', ' Longer.');
    expect(page.text()).toContain('Unsaved changes');
    expect(page.text()).toContain('Save your changes before you submit or publish them.');
    expect(button(page, 'Submit for review').attributes('disabled')).toBeDefined();

    await button(page, 'Save draft').trigger('click');
    await frames();
    expect(puts).toHaveLength(1);
    expect(puts[0]).toEqual({ version: 3, general: { label: doc('The new draft label. Longer.'), story: null }, families: null, technical: null });
    expect(page.text()).not.toContain('Unsaved changes');
  });

  it('offers to reload when someone else saved first', async () => {
    const { page } = await mountPanel(fixture(), () =>
      json(409, { error: { code: 'conflict', message: 'Someone else changed this interpretation since you opened it. Reload to see their changes.', fields: { version: 'current version is 4' } } }),
    );
    await type(page, 'General label', ' Mine.');
    await button(page, 'Save draft').trigger('click');
    await frames();
    expect(page.get('[role=alert]').text()).toContain('Someone else changed this interpretation since you opened it.');
    expect(button(page, 'Reload')).toBeDefined();
  });

  it('shows the curator’s comment on returned text, and reads without editors for a role that may not write', async () => {
    const { page } = await mountPanel(
      fixture({ returnComment: 'Say what the furnaces burned.', returnedBy: { id: 2, name: 'Tomasz Ellery' }, returnedAt: '2026-11-03T10:00:00.000Z', abilities: { update: false, submit: false, approve: false, return: false } }),
      () => json(500, {}),
    );
    expect(page.text()).toContain('Returned by Tomasz Ellery');
    expect(page.text()).toContain('Say what the furnaces burned.');
    expect(page.find('[role=toolbar]').exists()).toBe(false);
    expect(page.text()).toContain('No story for general readers.');
    expect(button(page, 'Save draft')).toBeUndefined();
  });
});
