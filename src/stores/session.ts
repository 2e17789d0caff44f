import { can as canRole, type Action, type Resource } from '@shared/permissions';
import type { LoginBody, SessionUser } from '@shared/schemas/auth';
import { defineStore } from 'pinia';
import { computed, ref } from 'vue';
import { fetchMe, signIn as apiSignIn, signOut as apiSignOut } from '@/api/auth';
import { ApiRequestError } from '@/api/client';

/** Who is signed in, and what they may do. `undefined` until the first check. */
export const useSessionStore = defineStore('session', () => {
  const user = ref<SessionUser | null | undefined>(undefined);
  const expiresAt = ref<string | null>(null);
  const signedIn = computed(() => Boolean(user.value));

  async function load(force = false): Promise<SessionUser | null> {
    if (user.value !== undefined && !force) return user.value;
    try {
      const me = await fetchMe();
      user.value = me.user;
      expiresAt.value = me.session.expiresAt;
    } catch (err) {
      if (err instanceof ApiRequestError && err.status === 401) user.value = null;
      else throw err;
    }
    return user.value ?? null;
  }

  async function signIn(body: LoginBody) {
    const result = await apiSignIn(body);
    user.value = result.user;
    expiresAt.value = result.session.expiresAt;
    return result.user;
  }

  async function signOut() {
    try {
      await apiSignOut();
    } finally {
      user.value = null;
    }
  }

  function forget() {
    user.value = null;
  }

  function can<R extends Resource>(resource: R, action: Action<R>): boolean {
    return canRole(user.value?.role, resource, action);
  }

  return { user, expiresAt, signedIn, load, signIn, signOut, forget, can };
});
