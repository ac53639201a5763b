import { Platform } from 'react-native';
import { preload } from 'swr';
import { diagnosisKey } from '@/hooks/use-diagnosis';
import { ME_KEY } from '@/hooks/use-me';
import { fetcher, setAuthToken } from '@/lib/api';
import { readToken } from '@/lib/token-store';

/** The diagnosis a web deep link opens (`/bench/diagnosis/:id`), or null. */
export function diagnosisInPath(pathname: string): string | null {
  const match = /^\/bench\/diagnosis\/([^/]+)\/?$/.exec(pathname);
  return match ? decodeURIComponent(match[1]) : null;
}

/**
 * Runs once while the bundle starts, before React mounts: with a stored token, asks at once and side by side
 * for the signed-in user and, on a link to a diagnosis, that diagnosis, instead of one after the other as the
 * fonts, the session and the screen come up. SWR hands each answer to the first hook that asks for its key.
 */
export function startEarlyRequests() {
  void readToken().then((token) => {
    if (!token) return;
    setAuthToken(token);
    // A failure is not handled here: the hook that takes the answer shows it (and a 401 ends the session).
    preload(ME_KEY, fetcher).catch(() => undefined);
    const id = Platform.OS === 'web' ? diagnosisInPath(window.location.pathname) : null;
    if (id) preload(diagnosisKey(id), fetcher).catch(() => undefined);
  });
}
