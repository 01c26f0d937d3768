import {
  sessionUserSchema,
  type LoginInput,
  type RegisterConfirmInput,
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

/**
 * `POST /api/auth/register`: through an invitation the account is made and signed in (the user);
 * a new organisation answers only "check your e-mail" (the message), whether or not the address
 * or the organisation exists, and the e-mailed link finishes it (`confirmRegistration`).
 */
export async function register(input: RegisterInput): Promise<{ user: SessionUser } | { message: string }> {
  const reply = await request<UserReply & { message?: string }>('/auth/register', { method: 'POST', body: input, quietUnauthorized: true });
  return typeof reply?.message === 'string' ? { message: reply.message } : { user: readUser(reply) };
}

/** `POST /api/auth/register/confirm`: the e-mailed link's token creates the account and signs it in. */
export async function confirmRegistration(input: RegisterConfirmInput): Promise<SessionUser> {
  return readUser(await request<UserReply>('/auth/register/confirm', { method: 'POST', body: input, quietUnauthorized: true }));
}

export async function requestPasswordReset(input: ResetRequestInput): Promise<void> {
  await request<void>('/auth/password-reset/request', { method: 'POST', body: input });
}

export async function confirmPasswordReset(input: ResetConfirmInput): Promise<void> {
  await request<void>('/auth/password-reset/confirm', { method: 'POST', body: input });
}
