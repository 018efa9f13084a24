/** Account calls: sign up, sign in, sign out, forgot and reset password (DEVELOPERS.md, HTTP API). */
import { api } from '@/lib/api/client';
import {
  userReplySchema,
  type ForgotPasswordBody,
  type ResetPasswordBody,
  type SignInBody,
  type SignUpBody,
  type User,
} from '@/lib/schema/api-auth';

export async function signUp(body: SignUpBody): Promise<User> {
  return (await api.post('/api/auth/sign-up', body, userReplySchema)).user;
}

export async function signIn(body: SignInBody): Promise<User> {
  return (await api.post('/api/auth/sign-in', body, userReplySchema)).user;
}

export async function signOut(): Promise<void> {
  await api.post('/api/auth/sign-out');
}

/** Always 202: the server does not tell whether the address has an account. */
export async function requestPasswordReset(body: ForgotPasswordBody): Promise<void> {
  await api.post('/api/auth/forgot-password', body);
}

export async function resetPassword(body: ResetPasswordBody): Promise<void> {
  await api.post('/api/auth/reset-password', body);
}
