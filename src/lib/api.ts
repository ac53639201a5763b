import type { ApiErrorBody } from '@shared/api/types';

/** An API failure with the HTTP status (0 when the server could not be reached). */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string>,
  ) {
    super(message);
    this.name = 'ApiError';
  }
}

let authToken: string | null = null;
let onUnauthorized: (() => void) | null = null;

/** The session sets the token every request carries, and is told when the server rejects it. */
export function setAuthToken(token: string | null) {
  authToken = token;
}

export function setUnauthorizedHandler(handler: (() => void) | null) {
  onUnauthorized = handler;
}

type Method = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

export interface RequestOptions {
  /** Sent as Idempotency-Key: a retry with the same key and body is answered once, never recorded twice. */
  idempotencyKey?: string;
}

export async function api<T>(path: string, method: Method = 'GET', body?: unknown, options: RequestOptions = {}): Promise<T> {
  const headers: Record<string, string> = { Accept: 'application/json' };
  if (body !== undefined) headers['Content-Type'] = 'application/json';
  if (authToken) headers.Authorization = `Bearer ${authToken}`;
  if (options.idempotencyKey) headers['Idempotency-Key'] = options.idempotencyKey;

  let response: Response;
  try {
    response = await fetch(path, { method, headers, body: body === undefined ? undefined : JSON.stringify(body) });
  } catch {
    throw new ApiError(0, 'unreachable', 'Probepath could not reach the server. Check the shop network and try again.');
  }

  if (response.status === 204) return undefined as T;
  const payload: unknown = await response.json().catch(() => null);
  if (response.ok) return payload as T;

  if (response.status === 401 && authToken) onUnauthorized?.();
  const error = (payload as ApiErrorBody | null)?.error;
  throw new ApiError(
    response.status,
    error?.code ?? 'http_' + response.status,
    error?.message ?? `The server answered ${response.status}. Try again in a moment.`,
    error?.fields,
  );
}

/** The swr fetcher: the key is the API path. */
export const fetcher = <T>(path: string) => api<T>(path);
