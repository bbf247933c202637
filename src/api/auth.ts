import type { PasswordChange, PasswordReset, PasswordResetRequest, Person, Register, SignIn } from '../../server/schemas/auth';
import { http } from './http';

export const getMe = () => http.get<Person>('/api/auth/me', undefined, { isUnauthenticatedExpected: true });

export const signIn = (body: SignIn) => http.post<Person>('/api/auth/sign-in', body, { isUnauthenticatedExpected: true });

export const signOut = () => http.post<void>('/api/auth/sign-out', undefined, { isUnauthenticatedExpected: true });

export const register = (body: Register) => http.post<Person>('/api/auth/register', body);

export const changePassword = (body: PasswordChange) => http.post<void>('/api/auth/password', body);

export const requestPasswordReset = (body: PasswordResetRequest) =>
  http.post<void>('/api/auth/password-reset/request', body);

export const resetPassword = (body: PasswordReset) => http.post<void>('/api/auth/password-reset', body);
