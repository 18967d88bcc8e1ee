import { CSRF_HEADER, apiErrorSchema, csrfTokenSchema, type ApiErrorDetail } from '@evenset/contracts';
import type { ZodType } from 'zod';

const API_BASE = '/api';

/** Paths whose 401 is an answer ("not signed in" / "wrong password"), not a lost session. */
const SESSION_PROBES: ReadonlySet<string> = new Set(['/auth/me', '/auth/login']);

export type QueryParams = Readonly<Record<string, string | number | undefined>>;
export type WriteMethod = 'POST' | 'PUT' | 'PATCH' | 'DELETE';
type Method = 'GET' | WriteMethod;

interface ApiErrorInit {
  status: number;
  code: string;
  message: string;
  details?: ApiErrorDetail[] | undefined;
  requestId?: string | undefined;
}

/** Every failed request, whatever went wrong, arrives as one of these. */
export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly details: readonly ApiErrorDetail[];
  readonly requestId: string | undefined;

  constructor(init: ApiErrorInit) {
    super(init.message);
    this.name = 'ApiError';
    this.status = init.status;
    this.code = init.code;
    this.details = init.details ?? [];
    this.requestId = init.requestId;
  }
}

let csrfToken: string | null = null;
let onUnauthorized: () => void = () => undefined;

/** The server hands out a new token at sign-in and sign-out; keep the latest. */
export function setCsrfToken(token: string | null): void {
  csrfToken = token;
}

/** Called when the session is found to be gone; returns a function that unregisters it. */
export function setUnauthorizedHandler(handler: () => void): () => void {
  onUnauthorized = handler;
  return () => {
    if (onUnauthorized === handler) onUnauthorized = () => undefined;
  };
}

export function apiGet<T>(path: string, schema: ZodType<T>, query?: QueryParams): Promise<T> {
  return request('GET', path, undefined, query).then((json) => parseAnswer(schema, json));
}

export function apiWrite<T>(method: WriteMethod, path: string, body: unknown, schema: ZodType<T>): Promise<T>;
export function apiWrite(method: WriteMethod, path: string, body?: unknown): Promise<void>;
export async function apiWrite<T>(
  method: WriteMethod,
  path: string,
  body?: unknown,
  schema?: ZodType<T>,
): Promise<T | void> {
  const json = await request(method, path, body);
  if (schema) return parseAnswer(schema, json);
}

async function request(method: Method, path: string, body?: unknown, query?: QueryParams): Promise<unknown> {
  const isWrite = method !== 'GET';
  let response = await send(method, path, body, query, isWrite ? await currentCsrfToken() : null);
  if (isWrite && response.status === 403) {
    const refusal = await toApiError(response);
    if (refusal.code !== 'CSRF_INVALID') throw refusal;
    // The token went stale (e.g. the session was renewed elsewhere): fetch a fresh one, retry once.
    response = await send(method, path, body, query, await fetchCsrfToken());
  }
  if (response.status >= 400) {
    const error = await toApiError(response);
    if (error.status === 401 && !SESSION_PROBES.has(path)) onUnauthorized();
    throw error;
  }
  const text = await response.text();
  return text === '' ? undefined : (JSON.parse(text) as unknown);
}

/**
 * Sends a multipart form (e.g. a certificate file with its fields) and reports the share sent,
 * 0 to 1, as it goes; fetch cannot report upload progress, so this one request uses XHR.
 */
export async function apiUpload<T>(
  path: string,
  form: FormData,
  schema: ZodType<T>,
  onProgress: (share: number) => void,
): Promise<T> {
  let answer = await sendForm(path, form, await currentCsrfToken(), onProgress);
  if (answer.status === 403 && errorFromText(answer.status, answer.text).code === 'CSRF_INVALID') {
    answer = await sendForm(path, form, await fetchCsrfToken(), onProgress);
  }
  if (answer.status >= 400) {
    const error = errorFromText(answer.status, answer.text);
    if (error.status === 401) onUnauthorized();
    throw error;
  }
  return parseAnswer(schema, answer.text === '' ? undefined : (JSON.parse(answer.text) as unknown));
}

function sendForm(
  path: string,
  form: FormData,
  token: string,
  onProgress: (share: number) => void,
): Promise<{ status: number; text: string }> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', `${API_BASE}${path}`);
    xhr.withCredentials = true;
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.setRequestHeader(CSRF_HEADER, token);
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable && event.total > 0) onProgress(event.loaded / event.total);
    };
    xhr.onload = () => resolve({ status: xhr.status, text: xhr.responseText });
    xhr.onerror = () =>
      reject(
        new ApiError({
          status: 0,
          code: 'NETWORK_ERROR',
          message: "The upload did not reach Evenset's server. Check the network connection, then try again.",
        }),
      );
    xhr.send(form);
  });
}

function errorFromText(status: number, text: string): ApiError {
  let json: unknown;
  try {
    json = JSON.parse(text) as unknown;
  } catch {
    json = undefined;
  }
  const parsed = apiErrorSchema.safeParse(json);
  if (parsed.success) return new ApiError({ status, ...parsed.data });
  return new ApiError({ status, code: `HTTP_${status}`, message: fallbackMessage(status) });
}

async function currentCsrfToken(): Promise<string> {
  return csrfToken ?? fetchCsrfToken();
}

async function fetchCsrfToken(): Promise<string> {
  const { csrfToken: token } = await apiGet('/auth/csrf', csrfTokenSchema);
  csrfToken = token;
  return token;
}

async function send(
  method: Method,
  path: string,
  body: unknown,
  query: QueryParams | undefined,
  token: string | null,
): Promise<Response> {
  const headers: Record<string, string> = { Accept: 'application/json' };
  if (body !== undefined) headers['Content-Type'] = 'application/json';
  if (token !== null) headers[CSRF_HEADER] = token;
  try {
    return await fetch(`${API_BASE}${path}${toSearch(query)}`, {
      method,
      headers,
      credentials: 'same-origin',
      body: body === undefined ? null : JSON.stringify(body),
    });
  } catch {
    throw new ApiError({
      status: 0,
      code: 'NETWORK_ERROR',
      message: "Evenset's server can't be reached. Check the network connection, then try again.",
    });
  }
}

function toSearch(query: QueryParams | undefined): string {
  if (!query) return '';
  const params = new URLSearchParams();
  for (const [name, value] of Object.entries(query)) {
    if (value !== undefined && value !== '') params.set(name, String(value));
  }
  const search = params.toString();
  return search === '' ? '' : `?${search}`;
}

async function toApiError(response: Response): Promise<ApiError> {
  let text = '';
  try {
    text = await response.text();
  } catch {
    // An unreadable body gets the fallback message for its status.
  }
  return errorFromText(response.status, text);
}

// Used only when the server (or a proxy in front of it) answers without our error body.
function fallbackMessage(status: number): string {
  if (status === 401) return 'Your session has ended. Sign in again.';
  if (status === 403) return "You don't have permission to do this.";
  if (status === 404) return 'This was not found. It may have been removed.';
  if (status === 429) return 'Too many attempts — wait a minute and try again.';
  if (status >= 500) {
    return 'The server ran into a problem. Try again in a moment; if it keeps happening, tell your administrator.';
  }
  return `The server refused the request (HTTP ${status}).`;
}

function parseAnswer<T>(schema: ZodType<T>, json: unknown): T {
  const parsed = schema.safeParse(json);
  if (parsed.success) return parsed.data;
  throw new ApiError({
    status: 200,
    code: 'UNEXPECTED_ANSWER',
    message:
      'The server answered in a shape this page does not understand. Reload the page; if that does not help, tell your administrator.',
  });
}
