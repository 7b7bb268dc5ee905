import { expireSession, getAccessToken } from './auth-token';

// The one way the web app talks to the Potlife API. Every error the API sends has the shape
// { statusCode, message, code }; this client turns it, and any failure to reach the server,
// into an ApiError whose message can be shown to the user as it is.

const API_BASE = (import.meta.env.VITE_API_BASE_URL ?? '/api').replace(/\/+$/, '');

export class ApiError extends Error {
  override readonly name = 'ApiError';

  constructor(
    readonly status: number,
    message: string,
    readonly code: string,
  ) {
    super(message);
  }
}

export function isApiError(error: unknown): error is ApiError {
  return error instanceof ApiError;
}

/** A sentence for the user, whatever was thrown. */
export function errorMessage(error: unknown): string {
  if (error instanceof ApiError) {
    return error.message;
  }
  if (error instanceof Error && error.message) {
    return error.message;
  }
  return 'Something went wrong. Please try again.';
}

export type HttpMethod = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';

export interface RequestOptions {
  method?: HttpMethod;
  /** Sent as JSON. */
  body?: unknown;
  signal?: AbortSignal;
  /**
   * Whether to send the bearer token (default true). Public calls (sign-in, registration,
   * invitations) pass false, so a stale token can neither travel with them nor end a session.
   */
  auth?: boolean;
  /** Extra request headers, e.g. an `Idempotency-Key` for a stock-changing form. */
  headers?: Record<string, string>;
}

const FALLBACK_MESSAGES: Record<number, string> = {
  400: 'The server could not accept that request.',
  401: 'You are not signed in.',
  403: 'Your role may not do that.',
  404: 'That record was not found.',
  409: 'That change conflicts with the current data.',
  413: 'That upload is too large.',
  429: 'Too many sign-in attempts. Wait a minute and try again.',
};

export function apiUrl(path: string): string {
  return `${API_BASE}${path.startsWith('/') ? path : `/${path}`}`;
}

async function readError(response: Response): Promise<ApiError> {
  let message: string | undefined;
  let code = `HTTP_${response.status}`;
  try {
    const body: unknown = await response.json();
    if (body && typeof body === 'object') {
      const record = body as Record<string, unknown>;
      if (typeof record.message === 'string' && record.message.trim() !== '') {
        message = record.message;
      } else if (Array.isArray(record.message)) {
        message = record.message.filter((part) => typeof part === 'string').join('; ') || undefined;
      }
      if (typeof record.code === 'string' && record.code !== '') {
        code = record.code;
      }
    }
  } catch {
    // Not JSON (a proxy's error page, an empty body): fall back to a sentence of our own.
  }
  const fallback =
    FALLBACK_MESSAGES[response.status] ??
    (response.status >= 500
      ? `The server had a problem (${response.status}). Please try again in a moment.`
      : `The request failed (${response.status}).`);
  return new ApiError(response.status, message ?? fallback, code);
}

async function send(path: string, options: RequestOptions, accept: string): Promise<Response> {
  const token = options.auth === false ? null : getAccessToken();
  const headers = new Headers({ ...options.headers, Accept: accept });
  if (options.body !== undefined) {
    headers.set('Content-Type', 'application/json');
  }
  if (token !== null) {
    headers.set('Authorization', `Bearer ${token}`);
  }

  let response: Response;
  try {
    response = await fetch(apiUrl(path), {
      method: options.method ?? (options.body === undefined ? 'GET' : 'POST'),
      headers,
      body: options.body === undefined ? undefined : JSON.stringify(options.body),
      signal: options.signal,
    });
  } catch (error) {
    if (error instanceof DOMException && error.name === 'AbortError') {
      throw error;
    }
    throw new ApiError(
      0,
      'Potlife cannot reach the server. Check your connection and try again.',
      'NETWORK_ERROR',
    );
  }

  if (!response.ok) {
    const error = await readError(response);
    // A refused token means the session is over. Only end it if the token refused is still the
    // current one (someone may have signed in again while this request was on its way).
    if (response.status === 401 && token !== null && getAccessToken() === token) {
      expireSession();
    }
    throw error;
  }
  return response;
}

/** Sends a request and returns the parsed JSON body (undefined for 204 No Content). */
export async function apiRequest<T>(path: string, options: RequestOptions = {}): Promise<T> {
  const response = await send(path, options, 'application/json');
  if (response.status === 204) {
    return undefined as T;
  }
  const text = await response.text();
  if (text === '') {
    return undefined as T;
  }
  try {
    return JSON.parse(text) as T;
  } catch {
    throw new ApiError(response.status, 'The server sent an answer Potlife could not read.', 'BAD_RESPONSE');
  }
}

type BodylessOptions = Omit<RequestOptions, 'method' | 'body'>;

export function apiGet<T>(path: string, options: BodylessOptions = {}): Promise<T> {
  return apiRequest<T>(path, { ...options, method: 'GET' });
}

export function apiPost<T>(path: string, body?: unknown, options: BodylessOptions = {}): Promise<T> {
  return apiRequest<T>(path, { ...options, method: 'POST', body: body ?? {} });
}

export function apiPatch<T>(path: string, body: unknown, options: BodylessOptions = {}): Promise<T> {
  return apiRequest<T>(path, { ...options, method: 'PATCH', body });
}

/** Downloads a file that needs the bearer token (so a plain link would not do). */
export async function apiGetBlob(path: string, options: BodylessOptions = {}): Promise<Blob> {
  const response = await send(path, { ...options, method: 'GET' }, '*/*');
  return response.blob();
}

/** Hands a downloaded file to the browser as if the user had clicked a download link. */
export function saveBlob(blob: Blob, filename: string): void {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = filename;
  link.rel = 'noopener';
  document.body.appendChild(link);
  link.click();
  link.remove();
  // Give the browser a moment to start the download before the URL is released.
  window.setTimeout(() => URL.revokeObjectURL(url), 10_000);
}
