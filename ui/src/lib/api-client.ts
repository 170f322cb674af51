import type { ErrorBody } from '../types/api';
import { clearToken, getToken } from './auth-token';

/**
 * The one HTTP client of the UI: prefixes /api, adds the bearer token, turns non-2xx answers
 * into {@link ApiError} carrying the server's own message, and on a 401 to an authenticated
 * request clears the token and hands control to the unauthorized handler (sign-in page).
 */

export const API_PREFIX = '/api';

/** An HTTP error with the server's message (`message` joined when it is a list). */
export class ApiError extends Error {
  readonly status: number;
  readonly body: unknown;

  constructor(status: number, message: string, body: unknown) {
    super(message);
    this.name = 'ApiError';
    this.status = status;
    this.body = body;
  }
}

let onUnauthorized: () => void = () => {
  window.location.assign('/sign-in');
};

/** Sets what happens after a 401 on an authenticated request (the app routes to /sign-in). */
export function setUnauthorizedHandler(handler: () => void): void {
  onUnauthorized = handler;
}

export interface RequestOptions {
  method?: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  /** A JSON-serialisable body. */
  json?: unknown;
  /** false for the routes that need no token (login); default true. */
  auth?: boolean;
  signal?: AbortSignal;
}

/** Sends a request and returns the parsed JSON body. Throws {@link ApiError}. */
export async function apiJson<T>(path: string, options: RequestOptions = {}): Promise<T> {
  const response = await send(path, options, 'application/json');
  if (response.status === 204) return undefined as T;
  return (await response.json()) as T;
}

/** Sends a GET and returns the raw bytes (binary endpoints). Throws {@link ApiError}. */
export async function apiBinary(path: string, options: Omit<RequestOptions, 'json'> = {}): Promise<ArrayBuffer> {
  const response = await send(path, options, 'application/octet-stream');
  return response.arrayBuffer();
}

export interface UploadOptions {
  /** Called with the share of the request body sent, 0..1. */
  onProgress?: (fraction: number) => void;
  signal?: AbortSignal;
}

/**
 * POSTs multipart form data with XMLHttpRequest (fetch has no upload progress) and returns
 * the parsed JSON body. Throws {@link ApiError} (its `body` keeps the parsed error body).
 */
export function apiUpload<T>(path: string, form: FormData, options: UploadOptions = {}): Promise<T> {
  return new Promise<T>((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', API_PREFIX + path);
    xhr.setRequestHeader('Accept', 'application/json');
    const token = getToken();
    if (token) xhr.setRequestHeader('Authorization', `Bearer ${token}`);
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable && event.total > 0) options.onProgress?.(event.loaded / event.total);
    };
    xhr.onload = () => {
      const body = parseJson(xhr.responseText);
      if (xhr.status >= 200 && xhr.status < 300) {
        options.onProgress?.(1);
        resolve(body as T);
        return;
      }
      if (xhr.status === 401 && token) handleUnauthorized();
      reject(new ApiError(xhr.status, errorMessage(xhr.status, body, xhr.statusText), body));
    };
    xhr.onerror = () => reject(new ApiError(0, 'The upload did not reach the server (network error).', null));
    xhr.onabort = () => reject(new DOMException('The upload was cancelled.', 'AbortError'));
    options.signal?.addEventListener('abort', () => xhr.abort(), { once: true });
    xhr.send(form);
  });
}

async function send(path: string, options: RequestOptions, accept: string): Promise<Response> {
  const headers = new Headers({ Accept: accept });
  const token = options.auth === false ? null : getToken();
  if (token) headers.set('Authorization', `Bearer ${token}`);
  let body: BodyInit | undefined;
  if (options.json !== undefined) {
    headers.set('Content-Type', 'application/json');
    body = JSON.stringify(options.json);
  }
  let response: Response;
  try {
    response = await fetch(API_PREFIX + path, { method: options.method ?? 'GET', headers, body, signal: options.signal });
  } catch (error) {
    if (error instanceof DOMException && error.name === 'AbortError') throw error;
    throw new ApiError(0, 'The server could not be reached (network error).', null);
  }
  if (response.ok) return response;
  const text = await response.text();
  const parsed = parseJson(text);
  if (response.status === 401 && options.auth !== false) handleUnauthorized();
  throw new ApiError(response.status, errorMessage(response.status, parsed, response.statusText), parsed);
}

function handleUnauthorized(): void {
  clearToken();
  onUnauthorized();
}

function parseJson(text: string): unknown {
  if (!text) return null;
  try {
    return JSON.parse(text);
  } catch {
    return text;
  }
}

/** The server's message when the body has one, else a plain statement of the status. */
export function errorMessage(status: number, body: unknown, statusText = ''): string {
  if (body && typeof body === 'object' && 'message' in body) {
    const message = (body as ErrorBody).message;
    if (Array.isArray(message) && message.length) return message.join('; ');
    if (typeof message === 'string' && message) return message;
  }
  if (typeof body === 'string' && body.trim() && body.length < 300) return body.trim();
  return `Request failed with status ${status}${statusText ? ` (${statusText})` : ''}.`;
}
