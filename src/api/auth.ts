import { z } from 'zod';
import { PublicUser } from '@shared/schemas/user.schema';
import type {
  LoginBody,
  RegisterBody,
  RequestPasswordResetBody,
  ResetPasswordBody,
  VerifyEmailBody,
} from '@shared/schemas/auth.schema';
import { get, post, resetCsrfToken } from './http';

const UserResponse = z.object({ user: PublicUser });

/** Google sign-in is a full-page navigation, not a fetch: the server redirects back to `/`. */
export const GOOGLE_SIGN_IN_PATH = '/api/auth/google';

/** The signed-in user; rejects with ApiError 401 `unauthenticated` when nobody is. */
export async function fetchMe(): Promise<PublicUser> {
  return (await get('/api/auth/me', UserResponse)).user;
}

export async function login(body: LoginBody): Promise<PublicUser> {
  const { user } = await post('/api/auth/login', body, UserResponse);
  resetCsrfToken();
  return user;
}

export async function register(body: RegisterBody): Promise<PublicUser> {
  const { user } = await post('/api/auth/register', body, UserResponse);
  resetCsrfToken();
  return user;
}

export async function logout(): Promise<void> {
  try {
    await post('/api/auth/logout');
  } finally {
    resetCsrfToken();
  }
}

/** Always answers 202, whether or not an account uses the address. */
export async function requestPasswordReset(body: RequestPasswordResetBody): Promise<void> {
  await post('/api/auth/password-reset/request', body);
}

export async function confirmPasswordReset(body: ResetPasswordBody): Promise<void> {
  await post('/api/auth/password-reset/confirm', body);
}

export async function verifyEmail(body: VerifyEmailBody): Promise<PublicUser> {
  return (await post('/api/auth/verify-email', body, UserResponse)).user;
}

export async function resendVerification(): Promise<void> {
  await post('/api/auth/verify-email/resend');
}
