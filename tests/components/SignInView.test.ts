// @vitest-environment happy-dom
import { flushPromises, mount } from '@vue/test-utils';
import { createPinia, setActivePinia } from 'pinia';
import PrimeVue from 'primevue/config';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { createMemoryHistory, createRouter } from 'vue-router';
import SignInView from '@/views/SignInView.vue';

function json(status: number, body: unknown) {
  return new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });
}

afterEach(() => {
  vi.unstubAllGlobals();
});

describe('SignInView', () => {
  it('shows the server’s generic message on 401, clears the password and stays on the page', async () => {
    const message = 'That e-mail address and password do not match an account.';
    const fetchMock = vi.fn((input: string | URL | Request) => {
      const path = String(input);
      if (path.endsWith('/auth/csrf')) return Promise.resolve(json(200, { csrfToken: 'token' }));
      if (path.endsWith('/auth/login')) return Promise.resolve(json(401, { error: { code: 'unauthenticated', message } }));
      return Promise.reject(new Error(`unexpected request ${path}`));
    });
    vi.stubGlobal('fetch', fetchMock);

    const pinia = createPinia();
    setActivePinia(pinia);
    const Empty = { template: '<div />' };
    const router = createRouter({
      history: createMemoryHistory(),
      routes: [
        { path: '/sign-in', name: 'sign-in', component: SignInView },
        { path: '/forgot', name: 'forgot-password', component: Empty },
        { path: '/', name: 'visit-home', component: Empty },
        { path: '/app', name: 'staff-home', component: Empty },
      ],
    });
    await router.push('/sign-in');
    const wrapper = mount(SignInView, { global: { plugins: [pinia, router, [PrimeVue, { unstyled: true }]] }, attachTo: document.body });

    await wrapper.find('input#email').setValue('keeper@example.test');
    await wrapper.find('input#password').setValue('wrong horse battery');
    await wrapper.find('form').trigger('submit');
    await flushPromises();

    expect(fetchMock).toHaveBeenCalledWith('/api/v1/auth/login', expect.objectContaining({ method: 'POST' }));
    const alert = wrapper.find('[role="alert"]');
    expect(alert.exists()).toBe(true);
    expect(alert.text()).toContain(message);
    expect((wrapper.find('input#password').element as HTMLInputElement).value).toBe('');
    expect(router.currentRoute.value.path).toBe('/sign-in');
    wrapper.unmount();
  });
});
