import {
  sessionUserSchema,
  type LoginInput,
  type RegisterInput,
  type ResetConfirmInput,
  type ResetRequestInput,
  type SessionUser,
} from '@shared/schemas/auth';
import { ApiError, request } from './http';

interface UserReply {
  user: unknown;
}

function readUser(reply: UserReply): SessionUser {
  const parsed = sessionUserSchema.safeParse(reply?.user);
  if (!parsed.success) throw new ApiError(200, 'bad-response', 'The server sent an account we could not read.');
  return parsed.data;
}

/** The signed-in user, or null when nobody is signed in. */
export async function fetchMe(): Promise<SessionUser | null> {
  try {
    return readUser(await request<UserReply>('/auth/me', { quietUnauthorized: true }));
  } catch (error) {
    if (error instanceof ApiError && error.status === 401) return null;
    throw error;
  }
}

export async function login(input: LoginInput): Promise<SessionUser> {
  return readUser(await request<UserReply>('/auth/login', { method: 'POST', body: input, quietUnauthorized: true }));
}

export async function logout(): Promise<void> {
  await request<void>('/auth/logout', { method: 'POST', quietUnauthorized: true });
}

export async function register(input: RegisterInput): Promise<SessionUser> {
  return readUser(await request<UserReply>('/auth/register', { method: 'POST', body: input, quietUnauthorized: true }));
}

export async function requestPasswordReset(input: ResetRequestInput): Promise<void> {
  await request<void>('/auth/password-reset/request', { method: 'POST', body: input });
}

export async function confirmPasswordReset(input: ResetConfirmInput): Promise<void> {
  await request<void>('/auth/password-reset/confirm', { method: 'POST', body: input });
}
