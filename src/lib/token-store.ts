import * as SecureStore from 'expo-secure-store';

/** Native: the session token lives in the platform keychain / keystore. */
const KEY = 'probepath.session-token';

export function readToken(): Promise<string | null> {
  return SecureStore.getItemAsync(KEY);
}

export function writeToken(token: string): Promise<void> {
  return SecureStore.setItemAsync(KEY, token);
}

export function clearToken(): Promise<void> {
  return SecureStore.deleteItemAsync(KEY);
}
