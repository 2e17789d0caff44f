import type { ErrorCode, ErrorEnvelope } from '@shared/schemas/common';

/** An error answer of the API, in its envelope's terms. */
export class ApiRequestError extends Error {
  constructor(
    readonly status: number,
    readonly code: ErrorCode | 'network',
    message: string,
    readonly fields: Record<string, string> = {},
    readonly retryAfterSeconds?: number,
  ) {
    super(message);
  }
}

type Query = Record<string, string | number | boolean | null | undefined>;

let csrfToken: string | null = null;
let onUnauthenticated: (() => void) | null = null;

/** Called when a request finds the session gone (signed out elsewhere, timed out, deactivated). */
export function whenUnauthenticated(handler: () => void) {
  onUnauthenticated = handler;
}

export function setCsrfToken(token: string | null) {
  csrfToken = token;
}

async function fetchCsrfToken(): Promise<string> {
  const { csrfToken: token } = await send<{ csrfToken: string }>('GET', '/auth/csrf');
  csrfToken = token;
  return token;
}

function url(path: string, query?: Query): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query ?? {})) {
    if (value !== undefined && value !== null && value !== '') params.set(key, String(value));
  }
  const qs = params.toString();
  return `/api/v1${path}${qs ? `?${qs}` : ''}`;
}

async function send<T>(method: string, path: string, options: { body?: unknown; query?: Query } = {}): Promise<T> {
  const headers: Record<string, string> = { accept: 'application/json' };
  if (options.body !== undefined) headers['content-type'] = 'application/json';
  if (method !== 'GET' && csrfToken) headers['x-csrf-token'] = csrfToken;
  let response: Response;
  try {
    response = await fetch(url(path, options.query), {
      method,
      headers,
      credentials: 'same-origin',
      body: options.body === undefined ? undefined : JSON.stringify(options.body),
    });
  } catch {
    throw new ApiRequestError(0, 'network', 'Shipkeeper cannot be reached. Check the connection and try again.');
  }
  if (response.status === 204) return undefined as T;
  const data = (await response.json().catch(() => null)) as unknown;
  if (!response.ok) {
    const envelope = data as Partial<ErrorEnvelope> | null;
    const error = envelope?.error;
    throw new ApiRequestError(
      response.status,
      error?.code ?? 'internal',
      error?.message ?? `The server answered ${response.status}.`,
      error?.fields ?? {},
      error?.retryAfterSeconds,
    );
  }
  return data as T;
}

/** One request to the API: sends the CSRF token on changes and renews it once if it is stale. */
export async function request<T>(method: 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE', path: string, options: { body?: unknown; query?: Query } = {}): Promise<T> {
  if (method !== 'GET' && !csrfToken) await fetchCsrfToken();
  try {
    return await send<T>(method, path, options);
  } catch (err) {
    if (err instanceof ApiRequestError && err.code === 'csrf') {
      await fetchCsrfToken();
      return send<T>(method, path, options);
    }
    if (err instanceof ApiRequestError && err.status === 401 && !path.startsWith('/auth/')) onUnauthenticated?.();
    throw err;
  }
}

export const api = {
  get: <T>(path: string, query?: Query) => request<T>('GET', path, { query }),
  post: <T>(path: string, body?: unknown) => request<T>('POST', path, { body: body ?? {} }),
  patch: <T>(path: string, body: unknown) => request<T>('PATCH', path, { body }),
  put: <T>(path: string, body: unknown) => request<T>('PUT', path, { body }),
  delete: <T>(path: string) => request<T>('DELETE', path),
};

/** Sends one file as multipart `file`, reporting the share sent (0–1) as it goes; `signal` aborts it. */
export async function upload<T>(path: string, file: File, onProgress?: (fraction: number) => void, options: { query?: Query; signal?: AbortSignal } = {}): Promise<T> {
  if (!csrfToken) await fetchCsrfToken();
  return new Promise<T>((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', url(path, options.query));
    xhr.setRequestHeader('accept', 'application/json');
    if (csrfToken) xhr.setRequestHeader('x-csrf-token', csrfToken);
    xhr.upload.onprogress = (event) => event.lengthComputable && onProgress?.(event.loaded / event.total);
    xhr.onerror = () => reject(new ApiRequestError(0, 'network', 'Shipkeeper cannot be reached. Check the connection and try again.'));
    xhr.onabort = () => reject(new ApiRequestError(0, 'network', 'The upload was cancelled.'));
    options.signal?.addEventListener('abort', () => xhr.abort(), { once: true });
    xhr.onload = () => {
      let data: unknown = null;
      try {
        data = JSON.parse(xhr.responseText);
      } catch {
        data = null;
      }
      if (xhr.status >= 200 && xhr.status < 300) return resolve(data as T);
      const error = (data as Partial<ErrorEnvelope> | null)?.error;
      if (xhr.status === 401) onUnauthenticated?.();
      reject(new ApiRequestError(xhr.status, error?.code ?? 'internal', error?.message ?? `The server answered ${xhr.status}.`, error?.fields ?? {}));
    };
    const form = new FormData();
    form.append('file', file);
    xhr.send(form);
  });
}

/** The address of an API resource, for links and downloads (CSV export). */
export function apiUrl(path: string, query?: Query): string {
  return url(path, query);
}
