import { defineStore } from 'pinia';
import { computed, ref } from 'vue';
import type { LoginInput, RegisterInput, Role, SessionUser } from '@shared/schemas/auth';
import * as authApi from '../api/auth';

/** Who is signed in. Loaded once at start from `GET /api/auth/me`; a 401 there means anonymous. */
export const useSessionStore = defineStore('session', () => {
  const user = ref<SessionUser | null>(null);
  let loading: Promise<void> | null = null;

  const signedIn = computed(() => user.value !== null);
  const role = computed<Role | null>(() => user.value?.role ?? null);

  /** Resolves once the start-up `me` call has answered; later calls reuse the same answer. */
  function ensureLoaded(): Promise<void> {
    loading ??= authApi
      .fetchMe()
      .then((me) => {
        user.value = me;
      })
      .catch(() => {
        // Server unreachable at start: treat as anonymous; the sign-in form will show the real error.
        user.value = null;
      });
    return loading;
  }

  async function signIn(input: LoginInput): Promise<SessionUser> {
    user.value = await authApi.login(input);
    return user.value;
  }

  /** The signed-in user (invitation), or the server's "check your e-mail" message (new organisation). */
  async function register(input: RegisterInput): Promise<{ user: SessionUser } | { message: string }> {
    const reply = await authApi.register(input);
    if ('user' in reply) user.value = reply.user;
    return reply;
  }

  async function confirmRegistration(token: string): Promise<SessionUser> {
    user.value = await authApi.confirmRegistration({ token });
    return user.value;
  }

  async function signOut(): Promise<void> {
    try {
      await authApi.logout();
    } finally {
      user.value = null;
    }
  }

  /** Forget the user locally (the server already said the session is gone). */
  function clear(): void {
    user.value = null;
  }

  return { user, signedIn, role, ensureLoaded, signIn, register, confirmRegistration, signOut, clear };
});
