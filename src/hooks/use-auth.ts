import useSWRMutation from 'swr/mutation';
import type { SignInResponse } from '@shared/api/types';
import type { ForgotPasswordInput, ResetPasswordInput, SignInInput } from '@shared/auth/schemas';
import { api, type ApiError } from '@/lib/api';

export function useSignIn() {
  return useSWRMutation<SignInResponse, ApiError, string, SignInInput>('/api/auth/sign-in', (path, { arg }) =>
    api(path, 'POST', arg),
  );
}

export function useForgotPassword() {
  return useSWRMutation<{ ok: true }, ApiError, string, ForgotPasswordInput>(
    '/api/auth/forgot-password',
    (path, { arg }) => api(path, 'POST', arg),
  );
}

export function useResetPassword() {
  return useSWRMutation<void, ApiError, string, ResetPasswordInput>('/api/auth/reset-password', (path, { arg }) =>
    api(path, 'POST', arg),
  );
}
