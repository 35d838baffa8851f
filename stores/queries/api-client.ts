import { API_BASE_URL } from '../client-env';

export type ApiErrorCode = string;

/** Any failed API call: the server's stable error body, or a network failure with code "network". */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: ApiErrorCode,
    message: string,
    readonly fields?: Record<string, string[]>,
    readonly body?: unknown,
  ) {
    super(message);
    this.name = 'ApiError';
  }

  get isNetwork(): boolean {
    return this.code === 'network';
  }
}

export const NETWORK_MESSAGE = "Can't reach the Trailtally server. Check your connection and try again.";

type ErrorShape = { error?: { code?: unknown; message?: unknown; fields?: unknown } };

function readError(status: number, body: unknown): ApiError {
  const error = (body as ErrorShape | undefined)?.error;
  const code = typeof error?.code === 'string' ? error.code : 'http_error';
  const message = typeof error?.message === 'string' ? error.message : `The server answered ${status}.`;
  const fields =
    error?.fields && typeof error.fields === 'object' ? (error.fields as Record<string, string[]>) : undefined;
  return new ApiError(status, code, message, fields, body);
}

/** One fetch wrapper for every call: cookies included, JSON in and out, errors as ApiError. */
export async function apiFetch<T>(path: string, init: RequestInit & { json?: unknown } = {}): Promise<T> {
  const { json, headers, ...rest } = init;
  let response: Response;
  try {
    response = await fetch(`${API_BASE_URL}${path}`, {
      credentials: 'include',
      ...rest,
      headers: {
        Accept: 'application/json',
        ...(json !== undefined ? { 'Content-Type': 'application/json' } : {}),
        ...headers,
      },
      body: json !== undefined ? JSON.stringify(json) : rest.body,
    });
  } catch {
    throw new ApiError(0, 'network', NETWORK_MESSAGE);
  }
  const text = await response.text();
  let body: unknown;
  try {
    body = text ? JSON.parse(text) : undefined;
  } catch {
    body = undefined;
  }
  if (!response.ok) throw readError(response.status, body);
  return body as T;
}

/** A 409's body carries the record as it is now on the server, so the screen can offer a choice. */
export function conflictCurrent<T>(error: unknown): T | null {
  if (!(error instanceof ApiError) || error.status !== 409) return null;
  const body = error.body as { current?: T } | undefined;
  return body?.current ?? null;
}
