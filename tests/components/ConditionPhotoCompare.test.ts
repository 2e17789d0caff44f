// @vitest-environment happy-dom
import type { ConditionHistory } from '@shared/schemas/condition';
import { flushPromises, mount } from '@vue/test-utils';
import PrimeVue from 'primevue/config';
import { describe, expect, it } from 'vitest';
import { createMemoryHistory, createRouter } from 'vue-router';
import ConditionPhotoCompare from '@/components/ConditionPhotoCompare.vue';

type Photo = ConditionHistory['photos'][number];

function photo(mediaId: number, date: string, overrides: Partial<Photo> = {}): Photo {
  return { mediaId, date, thumbUrl: `/m/${mediaId}/thumb`, displayUrl: `/m/${mediaId}/display`, caption: '', altText: '', reportId: 7, ...overrides };
}

// Newest first, as the API gives them.
const photos = [
  photo(5, '2026-11-20', { caption: 'Boiler front after repainting', reportId: 9 }),
  photo(4, '2026-11-20', { altText: 'Stokehold plating, dry' }),
  photo(3, '2024-05-16'),
  photo(2, '2023-05-12', { caption: 'Lagging torn', altText: 'Rust streaks below torn lagging' }),
  photo(1, '2023-05-12', { reportId: null }),
];
const entries: ConditionHistory['entries'] = [
  { kind: 'report', id: 9, date: '2026-11-20', grade: 'fair', status: 'draft', revision: 2, supersededById: null, summary: '', findingCount: 0 },
];

async function mountCompare(list: Photo[]) {
  const Empty = { template: '<div />' };
  const router = createRouter({ history: createMemoryHistory(), routes: [{ path: '/', component: Empty }, { path: '/condition/:id', name: 'condition-report', component: Empty }] });
  await router.push('/');
  const wrapper = mount(ConditionPhotoCompare, {
    props: { photos: list, subjectLabel: '2-40-0-E Boiler room', entries },
    global: { plugins: [router, [PrimeVue, { unstyled: true }]] },
    attachTo: document.body,
  });
  await flushPromises();
  return wrapper;
}

describe('ConditionPhotoCompare', () => {
  it('compares the oldest date with the newest by default, each date’s photos in its own column', async () => {
    const wrapper = await mountCompare(photos);
    const columns = wrapper.findAll('.condition-photo-compare__column');
    expect(columns.map((c) => c.attributes('data-date'))).toEqual(['2023-05-12', '2026-11-20']);

    const [older, newer] = columns;
    expect(older!.find('h4 time').attributes('datetime')).toBe('2023-05-12');
    expect(older!.findAll('img').map((i) => i.attributes('src'))).toEqual(['/m/2/display', '/m/1/display']);
    expect(newer!.findAll('img').map((i) => i.attributes('src'))).toEqual(['/m/5/display', '/m/4/display']);
    expect(wrapper.find('img[src="/m/3/display"]').exists()).toBe(false);

    // Alt text: the photo's own, else its caption, else what and when.
    expect(older!.findAll('img').map((i) => i.attributes('alt'))).toEqual(['Rust streaks below torn lagging', expect.stringMatching(/^Photo of 2-40-0-E Boiler room on /)]);
    expect(newer!.findAll('img').map((i) => i.attributes('alt'))).toEqual(['Boiler front after repainting', 'Stokehold plating, dry']);

    // Each photo names its report; a gallery photo says it has none.
    expect(newer!.find('a').attributes('href')).toBe('/condition/9');
    expect(newer!.find('a').text()).toContain('revision 2');
    expect(older!.text()).toContain('From the photo gallery, not a report');

    // Both choices are labelled, and neither offers the date the other one shows.
    expect(wrapper.find('#photo-compare-first').attributes('aria-labelledby')).toBe('photo-compare-first-label');
    expect(wrapper.find('#photo-compare-first-label').text()).toBe('First date');
    expect(wrapper.find('#photo-compare-second-label').text()).toBe('Second date');
    expect(wrapper.find('[aria-live="polite"]').text()).toMatch(/^Showing 2 photos of .+ beside 2 photos of .+\.$/);
    wrapper.unmount();
  });

  it('shows the other date when a choice changes', async () => {
    const wrapper = await mountCompare(photos);
    const select = wrapper.findComponent({ name: 'Select' });
    select.vm.$emit('update:modelValue', '2024-05-16');
    await flushPromises();
    const columns = wrapper.findAll('.condition-photo-compare__column');
    expect(columns.map((c) => c.attributes('data-date'))).toEqual(['2024-05-16', '2026-11-20']);
    expect(columns[0]!.findAll('img').map((i) => i.attributes('src'))).toEqual(['/m/3/display']);
    wrapper.unmount();
  });

  it('says so instead of comparing when the photos come from fewer than two dates', async () => {
    const one = await mountCompare(photos.filter((p) => p.date === '2024-05-16'));
    expect(one.findAll('.condition-photo-compare__column')).toHaveLength(0);
    expect(one.text()).toContain('Photos from one date only');
    one.unmount();

    const none = await mountCompare([]);
    expect(none.findAll('img')).toHaveLength(0);
    expect(none.text()).toContain('No photos yet');
    none.unmount();
  });
});
