/**
 * Native: the records are held for the app's lifetime. The interface is synchronous so the web build can
 * read localStorage while drawing; a persistent native store slots in behind the same four functions.
 */
const memory = new Map<string, string>();

export function readJSON<T>(key: string): T | null {
  const raw = memory.get(key);
  return raw === undefined ? null : (JSON.parse(raw) as T);
}

export function writeJSON(key: string, value: unknown): boolean {
  memory.set(key, JSON.stringify(value));
  return true;
}

export function removeKey(key: string): void {
  memory.delete(key);
}

export function keysStartingWith(prefix: string): string[] {
  return [...memory.keys()].filter((k) => k.startsWith(prefix));
}
