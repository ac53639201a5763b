import useSWR from 'swr';
import type { SessionUser } from '@shared/api/types';
import type { ApiError } from '@/lib/api';

export const ME_KEY = '/api/auth/me';

/**
 * The signed-in user, asked of the server only while a token is held. `remembered` (the user this device
 * last saw for the token) stands in until the server answers, and while it can't be reached.
 */
export function useMe(hasToken: boolean, remembered: SessionUser | null) {
  return useSWR<{ user: SessionUser }, ApiError>(hasToken ? ME_KEY : null, {
    fallbackData: remembered ? { user: remembered } : undefined,
  });
}
