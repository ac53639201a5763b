/** Web: expo-secure-store has no browser implementation, so the token lives in localStorage. */
const KEY = 'probepath.session-token';

export async function readToken(): Promise<string | null> {
  return window.localStorage.getItem(KEY);
}

export async function writeToken(token: string): Promise<void> {
  window.localStorage.setItem(KEY, token);
}

export async function clearToken(): Promise<void> {
  window.localStorage.removeItem(KEY);
}
