import type { ErrorIssue } from '../../server/schemas/error';

/** Every failed call surfaces as one of these, whatever went wrong underneath. */
export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly issues: ErrorIssue[];
  readonly requestId: string | undefined;

  constructor(status: number, code: string, message: string, issues: ErrorIssue[] = [], requestId?: string) {
    super(message);
    this.name = 'ApiError';
    this.status = status;
    this.code = code;
    this.issues = issues;
    this.requestId = requestId;
  }
}

export type Query = Record<string, string | number | boolean | null | undefined>;

export interface RequestOptions {
  body?: unknown;
  query?: Query;
  /** Sign-in and the first "who am I" expect a 401 and must not bounce the person to sign-in. */
  isUnauthenticatedExpected?: boolean;
  /** The public tools change nothing on the server, so they need no session and no CSRF token. */
  isStateless?: boolean;
}

type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';

let csrfToken: string | null = null;
let onUnauthenticated: (() => void) | null = null;

/** main.ts wires this to the session store and router, so http.ts imports neither. */
export function setUnauthenticatedHandler(handler: () => void): void {
  onUnauthenticated = handler;
}

function buildUrl(path: string, query?: Query): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query ?? {})) {
    if (value !== undefined && value !== null && value !== '') params.set(key, String(value));
  }
  const text = params.toString();
  return text ? `${path}?${text}` : path;
}

async function send(method: Method, url: string, body: unknown, token: string | null): Promise<Response> {
  const headers: Record<string, string> = { accept: 'application/json' };
  if (body !== undefined) headers['content-type'] = 'application/json';
  if (token) headers['x-csrf-token'] = token;
  try {
    return await fetch(url, {
      method,
      headers,
      credentials: 'same-origin',
      body: body === undefined ? undefined : JSON.stringify(body),
    });
  } catch {
    // fetch only rejects when the network is gone — common at the far end of an allotment.
    throw new ApiError(0, 'NETWORK', "Can't reach Spurwood. Check your signal and try again.");
  }
}

async function readJson(response: Response): Promise<unknown> {
  const text = await response.text();
  if (!text) return undefined;
  try {
    return JSON.parse(text) as unknown;
  } catch {
    return undefined;
  }
}

export function toApiError(status: number, payload: unknown): ApiError {
  const envelope = (payload as { error?: Partial<Record<string, unknown>> } | undefined)?.error;
  if (envelope && typeof envelope.code === 'string' && typeof envelope.message === 'string') {
    const issues = Array.isArray(envelope.issues) ? (envelope.issues as ErrorIssue[]) : [];
    const requestId = typeof envelope.requestId === 'string' ? envelope.requestId : undefined;
    return new ApiError(status, envelope.code, envelope.message, issues, requestId);
  }
  return new ApiError(status, status >= 500 ? 'INTERNAL' : 'UNKNOWN', 'Something went wrong on our side. Try again in a moment.');
}

async function fetchCsrfToken(): Promise<string> {
  const response = await send('GET', '/api/auth/csrf', undefined, null);
  const payload = await readJson(response);
  if (!response.ok) throw toApiError(response.status, payload);
  const token = (payload as { token?: unknown } | undefined)?.token;
  if (typeof token !== 'string') throw new ApiError(response.status, 'INTERNAL', 'The server sent no security token.');
  csrfToken = token;
  return token;
}

const isCsrfFailure = (error: ApiError) => error.status === 403 && /csrf/i.test(error.code);

/** For upload.ts, which sends files through XMLHttpRequest to report progress: the same token and 401 handling. */
export const writeToken = (fresh = false): Promise<string> => (!fresh && csrfToken ? Promise.resolve(csrfToken) : fetchCsrfToken());
export const reportUnauthenticated = (): void => onUnauthenticated?.();

export async function request<T>(method: Method, path: string, options: RequestOptions = {}): Promise<T> {
  const url = buildUrl(path, options.query);
  const isWrite = method !== 'GET' && !options.isStateless;
  const token = isWrite ? (csrfToken ?? (await fetchCsrfToken())) : null;
  let response = await send(method, url, options.body, token);
  let payload = await readJson(response);
  if (!response.ok && isWrite && isCsrfFailure(toApiError(response.status, payload))) {
    // The token is tied to the session; a new session (after a restart, say) needs a new token. Once.
    response = await send(method, url, options.body, await fetchCsrfToken());
    payload = await readJson(response);
  }
  if (response.ok) return payload as T;
  const error = toApiError(response.status, payload);
  if (error.status === 401 && !options.isUnauthenticatedExpected) onUnauthenticated?.();
  throw error;
}

export const http = {
  get: <T>(path: string, query?: Query, options?: RequestOptions) => request<T>('GET', path, { ...options, query }),
  post: <T>(path: string, body?: unknown, options?: RequestOptions) => request<T>('POST', path, { ...options, body }),
  patch: <T>(path: string, body: unknown) => request<T>('PATCH', path, { body }),
  put: <T>(path: string, body: unknown) => request<T>('PUT', path, { body }),
  delete: <T = void>(path: string) => request<T>('DELETE', path),
};
