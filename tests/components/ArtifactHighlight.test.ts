// @vitest-environment happy-dom
import { HIGHLIGHT_END as END, HIGHLIGHT_START as START } from '@shared/schemas/artifacts';
import { mount } from '@vue/test-utils';
import { describe, expect, it } from 'vitest';
import ArtifactHighlight from '@/components/ArtifactHighlight.vue';

describe('ArtifactHighlight', () => {
  it('marks each match and keeps the text between them', () => {
    const wrapper = mount(ArtifactHighlight, { props: { text: `Main ${START}feed${END} pump ${START}gauge${END}, brass` } });
    expect(wrapper.findAll('mark').map((m) => m.text())).toEqual(['feed', 'gauge']);
    expect(wrapper.text()).toBe('Main feed pump gauge, brass');
  });

  it('shows HTML in the text as text, not as elements', () => {
    const wrapper = mount(ArtifactHighlight, { props: { text: `<img src=x onerror=alert(1)> ${START}<b>valve</b>${END}` } });
    expect(wrapper.find('img').exists()).toBe(false);
    expect(wrapper.find('b').exists()).toBe(false);
    expect(wrapper.find('mark').text()).toBe('<b>valve</b>');
    expect(wrapper.text()).toBe('<img src=x onerror=alert(1)> <b>valve</b>');
  });

  it('shows plain text without marks, and an unclosed match as marked to the end', () => {
    expect(mount(ArtifactHighlight, { props: { text: 'Engine telegraph' } }).find('mark').exists()).toBe(false);
    const wrapper = mount(ArtifactHighlight, { props: { text: `Steam ${START}whistle` } });
    expect(wrapper.find('mark').text()).toBe('whistle');
  });
});
