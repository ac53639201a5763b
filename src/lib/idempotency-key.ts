import { useCallback, useRef } from 'react';

/**
 * A fresh Idempotency-Key: 32 hex digits. getRandomValues works on plain-http shop networks, where
 * crypto.randomUUID is withheld (it needs a secure context).
 */
export function newIdempotencyKey(): string {
  const bytes = new Uint8Array(16);
  if (globalThis.crypto?.getRandomValues) globalThis.crypto.getRandomValues(bytes);
  else for (let i = 0; i < bytes.length; i++) bytes[i] = Math.floor(Math.random() * 256);
  return Array.from(bytes, (b) => b.toString(16).padStart(2, '0')).join('');
}

/**
 * One key per distinct request body: sending the same form again after a lost answer reuses the key, so
 * the server answers once; a changed form is a new request with a new key.
 */
export function useRequestKey(): (body: unknown) => string {
  const last = useRef<{ body: string; key: string } | null>(null);
  return useCallback((body: unknown) => {
    const json = JSON.stringify(body);
    if (last.current?.body !== json) last.current = { body: json, key: newIdempotencyKey() };
    return last.current.key;
  }, []);
}
