import { ApiError, apiUrl } from './api-client';
import { expireSession, getAccessToken } from './auth-token';

// Requests whose progress the user watches: a file upload (multipart) or a large JSON body such as
// a CSV import. fetch cannot report upload progress, so these go by XMLHttpRequest, with the same
// bearer token, error shape and session expiry as api-client.

export interface SendProgress {
  /** 0–1 of the body sent; null while the size is unknown. */
  fraction: number | null;
  /** 'sending' while the body goes up, 'waiting' once it is all sent and the server works on it. */
  phase: 'sending' | 'waiting';
}

export interface ProgressRequestOptions {
  method?: 'POST' | 'PUT' | 'PATCH';
  /** FormData goes as multipart; anything else as JSON. */
  body: FormData | unknown;
  headers?: Record<string, string>;
  onProgress?: (progress: SendProgress) => void;
  signal?: AbortSignal;
}

const FALLBACK: Record<number, string> = {
  400: 'The server could not accept that request.',
  403: 'Your role may not do that.',
  404: 'That record was not found.',
  409: 'That change conflicts with the current data.',
  413: 'That upload is too large.',
  415: 'That kind of file is not accepted.',
  422: 'The server could not accept that file.',
};

function errorFrom(status: number, text: string): ApiError {
  let message: string | undefined;
  let code = `HTTP_${status}`;
  try {
    const body: unknown = JSON.parse(text);
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
    // Not JSON: a sentence of our own below.
  }
  const fallback =
    FALLBACK[status] ??
    (status >= 500
      ? `The server had a problem (${status}). Please try again in a moment.`
      : `The request failed (${status}).`);
  return new ApiError(status, message ?? fallback, code);
}

/** Sends a body with progress reports and returns the parsed JSON answer. */
export function apiSendWithProgress<T>(path: string, options: ProgressRequestOptions): Promise<T> {
  return new Promise<T>((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    const token = getAccessToken();
    xhr.open(options.method ?? 'POST', apiUrl(path));
    xhr.setRequestHeader('Accept', 'application/json');
    for (const [name, value] of Object.entries(options.headers ?? {})) {
      xhr.setRequestHeader(name, value);
    }
    if (token !== null) {
      xhr.setRequestHeader('Authorization', `Bearer ${token}`);
    }
    const isForm = typeof FormData !== 'undefined' && options.body instanceof FormData;
    if (!isForm) {
      xhr.setRequestHeader('Content-Type', 'application/json');
    }

    xhr.upload.onprogress = (event) => {
      options.onProgress?.({
        fraction: event.lengthComputable && event.total > 0 ? event.loaded / event.total : null,
        phase: 'sending',
      });
    };
    xhr.upload.onload = () => options.onProgress?.({ fraction: 1, phase: 'waiting' });

    xhr.onload = () => {
      if (xhr.status >= 200 && xhr.status < 300) {
        if (xhr.status === 204 || xhr.responseText === '') {
          resolve(undefined as T);
          return;
        }
        try {
          resolve(JSON.parse(xhr.responseText) as T);
        } catch {
          reject(
            new ApiError(xhr.status, 'The server sent an answer Potlife could not read.', 'BAD_RESPONSE'),
          );
        }
        return;
      }
      if (xhr.status === 401 && token !== null && getAccessToken() === token) {
        expireSession();
      }
      reject(errorFrom(xhr.status, xhr.responseText));
    };
    xhr.onerror = () =>
      reject(
        new ApiError(
          0,
          'Potlife cannot reach the server. Check your connection and try again.',
          'NETWORK_ERROR',
        ),
      );
    xhr.onabort = () => reject(new DOMException('The upload was stopped.', 'AbortError'));

    if (options.signal) {
      if (options.signal.aborted) {
        xhr.abort();
        return;
      }
      options.signal.addEventListener('abort', () => xhr.abort(), { once: true });
    }
    xhr.send(isForm ? (options.body as FormData) : JSON.stringify(options.body));
  });
}

/** Reads a text file in the browser, reporting how much of it has been read (0–1). */
export function readTextFile(file: Blob, onProgress?: (fraction: number) => void): Promise<string> {
  return new Promise<string>((resolve, reject) => {
    const reader = new FileReader();
    reader.onprogress = (event) => {
      if (event.lengthComputable && event.total > 0) {
        onProgress?.(event.loaded / event.total);
      }
    };
    reader.onload = () => {
      onProgress?.(1);
      resolve(typeof reader.result === 'string' ? reader.result : '');
    };
    reader.onerror = () => reject(new Error('The file could not be read. Choose it again.'));
    reader.readAsText(file, 'utf-8');
  });
}

/** A fresh Idempotency-Key for a form that changes stock: one per opening of the form. */
export function newIdempotencyKey(): string {
  if (typeof crypto !== 'undefined' && typeof crypto.randomUUID === 'function') {
    return crypto.randomUUID();
  }
  return `k-${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 12)}`;
}
