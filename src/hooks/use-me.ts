import useSWR from 'swr';
import type { SessionUser } from '@shared/api/types';
import type { ApiError } from '@/lib/api';

export const ME_KEY = '/api/auth/me';

/** The signed-in user, asked of the server only while a token is held. */
export function useMe(hasToken: boolean) {
  return useSWR<{ user: SessionUser }, ApiError>(hasToken ? ME_KEY : null);
}
