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

  const response = await reach(path, { method, headers, body: body === undefined ? undefined : JSON.stringify(body) });
  if (response.status === 204) return undefined as T;
  const payload: unknown = await response.json().catch(() => null);
  if (response.ok) return payload as T;
  throw failure(response, payload);
}

/**
 * For what is not JSON both ways: a multipart upload, or a PDF or photo to read as a blob. Carries the
 * token (and Idempotency-Key); a failure throws the same ApiError as `api`.
 */
export async function apiRaw(path: string, init: { method?: Method; body?: FormData } = {}, options: RequestOptions = {}): Promise<Response> {
  const headers: Record<string, string> = {};
  if (authToken) headers.Authorization = `Bearer ${authToken}`;
  if (options.idempotencyKey) headers['Idempotency-Key'] = options.idempotencyKey;
  const response = await reach(path, { method: init.method ?? 'GET', headers, body: init.body });
  if (response.ok) return response;
  throw failure(response, await response.json().catch(() => null));
}

/** The token as a header, for native image views that load a URL themselves. */
export function authHeaders(): Record<string, string> {
  return authToken ? { Authorization: `Bearer ${authToken}` } : {};
}

async function reach(path: string, init: RequestInit): Promise<Response> {
  try {
    return await fetch(path, init);
  } catch {
    throw new ApiError(0, 'unreachable', 'Probepath could not reach the server. Check the shop network and try again.');
  }
}

function failure(response: Response, payload: unknown): ApiError {
  if (response.status === 401 && authToken) onUnauthorized?.();
  const error = (payload as ApiErrorBody | null)?.error;
  return new ApiError(
    response.status,
    error?.code ?? 'http_' + response.status,
    error?.message ?? `The server answered ${response.status}. Try again in a moment.`,
    error?.fields,
  );
}

/** The swr fetcher: the key is the API path. */
export const fetcher = <T>(path: string) => api<T>(path);
