// @vitest-environment happy-dom
import type { RichTextDoc } from '@shared/schemas/rich-text';
import { DOMWrapper, flushPromises, mount } from '@vue/test-utils';
import PrimeVue from 'primevue/config';
import { afterEach, describe, expect, it } from 'vitest';
import { nextTick, ref } from 'vue';
import RichTextEditor from '@/components/RichTextEditor.vue';
import RichTextFigures from '@/components/RichTextFigures.vue';

const doc = (...content: unknown[]) => ({ type: 'doc', content }) as RichTextDoc;
const para = (text: string) => ({ type: 'paragraph', content: [{ type: 'text', text }] });

async function mountEditor(start: RichTextDoc, props: Record<string, unknown> = {}) {
  const model = ref<RichTextDoc>(start);
  const wrapper = mount(RichTextEditor, {
    props: { label: 'Story', modelValue: model.value, 'onUpdate:modelValue': (v: RichTextDoc) => (model.value = v), ...props },
    global: { plugins: [[PrimeVue, { unstyled: true }]] },
    attachTo: document.body,
  });
  await flushPromises();
  await nextTick();
  return { wrapper, model, page: new DOMWrapper(document.body) };
}

/** The editor's state reaches Vue two animation frames after a change, as @tiptap/vue-3 debounces it. */
async function frames() {
  await new Promise((resolve) => requestAnimationFrame(() => requestAnimationFrame(resolve)));
  await nextTick();
}

/** Typing as a browser does it: the text lands in the DOM and ProseMirror reads the change back. */
async function type(area: HTMLElement, text: string) {
  area.focus();
  const paragraph = area.querySelector('p')!;
  paragraph.textContent = (paragraph.textContent ?? '') + text;
  await new Promise((resolve) => setTimeout(resolve, 20));
  await frames();
}

function selectAll(area: HTMLElement) {
  area.focus();
  area.dispatchEvent(new KeyboardEvent('keydown', { key: 'a', code: 'KeyA', ctrlKey: true, bubbles: true, cancelable: true }));
}

const button = (page: DOMWrapper<Element>, name: string) => page.find<HTMLButtonElement>(`[role=toolbar] button[aria-label="${name}"]`);

afterEach(() => {
  document.body.innerHTML = '';
});

describe('RichTextEditor', () => {
  it('labels its writing area and toolbar', async () => {
    const { page } = await mountEditor(doc(para('A lamp')));
    const area = page.get('[role=textbox]');
    expect(area.attributes('aria-label')).toBe('Story');
    expect(area.attributes('aria-multiline')).toBe('true');
    expect(page.get('[role=toolbar]').attributes('aria-label')).toBe('Story: formatting');
    for (const name of ['Bold', 'Italic', 'Strikethrough', 'Heading 2', 'Heading 3', 'Bullet list', 'Numbered list', 'Quote', 'Link', 'Photo from the collection', 'Explainer', 'Undo', 'Redo']) {
      expect(button(page, name).exists(), name).toBe(true);
    }
    expect(button(page, 'Bold').attributes('aria-pressed')).toBe('false');
  });

  it('typing changes the v-model', async () => {
    const { page, model } = await mountEditor(doc({ type: 'paragraph' }));
    await type(page.get<HTMLElement>('[role=textbox]').element, 'Brass');
    expect(model.value).toEqual(doc(para('Brass')));
    expect(page.text()).toContain('5 characters');
  });

  it('toolbar buttons change the v-model and show as pressed', async () => {
    const { page, model } = await mountEditor(doc(para('Feed pump')));
    const area = page.get<HTMLElement>('[role=textbox]').element;
    selectAll(area);
    await button(page, 'Bold').trigger('click');
    await frames();
    expect(model.value.content?.[0]).toEqual({ type: 'paragraph', content: [{ type: 'text', text: 'Feed pump', marks: [{ type: 'bold' }] }] });
    expect(button(page, 'Bold').attributes('aria-pressed')).toBe('true');

    await button(page, 'Heading 2').trigger('click');
    await frames();
    expect(model.value.content?.[0]).toMatchObject({ type: 'heading', attrs: { level: 2 } });
    expect(button(page, 'Heading 2').attributes('aria-pressed')).toBe('true');

    await button(page, 'Bullet list').trigger('click');
    await nextTick();
    expect(model.value.content?.[0]).toMatchObject({ type: 'bulletList' });

    // Changes close in time join one step of the history: undo takes back at least the list.
    await button(page, 'Undo').trigger('click');
    await frames();
    expect(model.value.content?.[0]?.type).not.toBe('bulletList');
    expect(button(page, 'Redo').attributes('disabled')).toBeUndefined();
    await button(page, 'Redo').trigger('click');
    expect(model.value.content?.[0]).toMatchObject({ type: 'bulletList' });
  });

  it('takes a new v-model from outside without echoing it back', async () => {
    const { wrapper, page, model } = await mountEditor(doc(para('Old')));
    await wrapper.setProps({ modelValue: doc(para('Reloaded from the server')) });
    await nextTick();
    expect(page.get('[role=textbox]').text()).toBe('Reloaded from the server');
    expect(model.value).toEqual(doc(para('Old')));
  });

  it('refuses a link to a script address with a clear message', async () => {
    const { page, model } = await mountEditor(doc(para('Harbour trust')));
    selectAll(page.get<HTMLElement>('[role=textbox]').element);
    await button(page, 'Link').trigger('click');
    await flushPromises();
    const input = page.get<HTMLInputElement>('input[inputmode=url]');
    await input.setValue('javascript:alert(1)');
    await page.get('form').trigger('submit');
    expect(page.get('[role=alert]').text()).toContain('only to web addresses');
    await input.setValue('https://example.org/trust');
    await page.get('form').trigger('submit');
    await nextTick();
    expect(model.value.content?.[0]).toMatchObject({ content: [{ text: 'Harbour trust', marks: [{ type: 'link', attrs: { href: 'https://example.org/trust' } }] }] });
  });

  it('inserts a photo from the collection only with alt text', async () => {
    const media = [{ id: 7, caption: 'Gauge board', altText: '' }];
    const { page, model } = await mountEditor(doc(para('See')), { media });
    await button(page, 'Photo from the collection').trigger('click');
    await flushPromises();
    await page.get('button[aria-label="Gauge board"]').trigger('click');
    await page.get('form').trigger('submit');
    expect(page.get('[role=alert]').text()).toContain('alt text is required');
    await page.get('textarea').setValue('Six round gauges on a painted board');
    await page.get('form').trigger('submit');
    await nextTick();
    const image = model.value.content?.find((n) => n.type === 'image');
    expect(image?.attrs).toMatchObject({ src: '/api/v1/media/7/display', alt: 'Six round gauges on a painted board', title: 'Gauge board' });
  });
});

describe('RichTextFigures', () => {
  it('warns when a label is over its word limit', () => {
    const words = Array.from({ length: 12 }, () => 'word').join(' ');
    const wrapper = mount(RichTextFigures, { props: { doc: doc(para(`${words}.`)), maxWords: 10, maxGrade: 8 } });
    expect(wrapper.text()).toContain('12 of 10');
    expect(wrapper.get('[role=status]').text()).toContain('2 words over the limit of 10.');
  });
});
