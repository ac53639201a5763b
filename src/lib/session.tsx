import { createContext, type ReactNode, useCallback, useContext, useEffect, useMemo, useState } from 'react';
import { useSWRConfig } from 'swr';
import type { SessionUser, SignInResponse } from '@shared/api/types';
import { ME_KEY, useMe } from '@/hooks/use-me';
import { type ApiError, setAuthToken, setUnauthorizedHandler } from '@/lib/api';
import { readJSON, removeKey, writeJSON } from '@/lib/device-storage';
import { clearToken, readToken, writeToken } from '@/lib/token-store';

/** The user the stored token belongs to, so a reload without signal still opens the shop. */
const REMEMBERED_USER = 'probepath.session-user';

type SessionState =
  | { status: 'loading' }
  | { status: 'signed-out' }
  | { status: 'signed-in'; user: SessionUser; unreachable: { error: ApiError; retry: () => void } | null }
  | { status: 'unreachable'; error: ApiError; retry: () => void };

interface SessionContextValue {
  session: SessionState;
  /** Keep the token from sign-in or an accepted invite and become that user. */
  startSession: (response: SignInResponse) => Promise<void>;
  /** Forget the token and every cached answer from the server. */
  signOut: () => Promise<void>;
}

const SessionContext = createContext<SessionContextValue | null>(null);

export function SessionProvider({ children }: { children: ReactNode }) {
  const { mutate } = useSWRConfig();
  // undefined while the stored token is still being read.
  const [token, setToken] = useState<string | null | undefined>(undefined);
  const [remembered, setRemembered] = useState(() => readJSON<SessionUser>(REMEMBERED_USER));
  const me = useMe(Boolean(token), remembered);

  useEffect(() => {
    void readToken().then((stored) => {
      setAuthToken(stored);
      setToken(stored);
    });
  }, []);

  const clearCache = useCallback(() => mutate(() => true, undefined, { revalidate: false }), [mutate]);

  const signOut = useCallback(async () => {
    setAuthToken(null);
    setToken(null);
    setRemembered(null);
    removeKey(REMEMBERED_USER);
    await clearToken();
    await clearCache();
  }, [clearCache]);

  const startSession = useCallback(
    async ({ token: next, user }: SignInResponse) => {
      await clearCache();
      await writeToken(next);
      setAuthToken(next);
      await mutate(ME_KEY, { user }, { revalidate: false });
      setToken(next);
    },
    [clearCache, mutate],
  );

  useEffect(() => {
    if (token && me.data && !me.isValidating) writeJSON(REMEMBERED_USER, me.data.user);
  }, [token, me.data, me.isValidating]);

  // The server refused the token (expired, or the member was deactivated): drop the session.
  useEffect(() => {
    setUnauthorizedHandler(() => void signOut());
    return () => setUnauthorizedHandler(null);
  }, [signOut]);
  // The same for a refusal that came back before the handler was set (the user asked for as the app started).
  useEffect(() => {
    if (token && me.error?.status === 401) void signOut();
  }, [token, me.error, signOut]);

  const session = useMemo<SessionState>(() => {
    if (token === undefined) return { status: 'loading' };
    if (token === null) return { status: 'signed-out' };
    if (me.data) {
      const unreachable = me.error && me.error.status !== 401 ? { error: me.error, retry: () => void me.mutate() } : null;
      return { status: 'signed-in', user: me.data.user, unreachable };
    }
    if (me.error && me.error.status !== 401) return { status: 'unreachable', error: me.error, retry: () => void me.mutate() };
    return { status: 'loading' };
  }, [token, me.data, me.error, me.mutate]);

  const value = useMemo(() => ({ session, startSession, signOut }), [session, startSession, signOut]);
  return <SessionContext.Provider value={value}>{children}</SessionContext.Provider>;
}

export function useSession(): SessionContextValue {
  const value = useContext(SessionContext);
  if (!value) throw new Error('useSession needs a SessionProvider above it.');
  return value;
}

/** The member using the app; only for screens inside the signed-in shell. */
export function useUser(): SessionUser {
  const { session } = useSession();
  if (session.status !== 'signed-in') throw new Error('useUser is only for signed-in screens.');
  return session.user;
}
