import type { ApiError, Issue } from '@/shared/api/common';

/**
 * The one HTTP client of the app: every request to the API goes through `apiRequest`.
 * The session lives in an httpOnly cookie, so requests always carry credentials.
 */

/** Same origin in production (Express serves the app); `npm run dev` points :8081 at the API on :8080. */
const BASE_URL = process.env.EXPO_PUBLIC_API_URL ?? '';

/** A non-2xx answer, with the server's sentence and field issues kept so forms can show them inline. */
export class ApiRequestError extends Error {
  readonly status: number;
  readonly error: string;
  readonly issues: Issue[];
  readonly body: unknown;

  constructor(status: number, body: unknown) {
    const parsed = readErrorBody(body);
    super(parsed.error ?? fallbackMessage(status));
    this.name = 'ApiRequestError';
    this.status = status;
    this.error = this.message;
    this.issues = parsed.issues ?? [];
    this.body = body;
  }
}

export function isApiRequestError(value: unknown): value is ApiRequestError {
  return value instanceof ApiRequestError;
}

type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';

export async function apiRequest<T>(method: Method, path: string, body?: unknown): Promise<T> {
  let response: Response;
  try {
    response = await fetch(BASE_URL + path, {
      method,
      credentials: 'include',
      headers: body === undefined ? { Accept: 'application/json' } : { Accept: 'application/json', 'Content-Type': 'application/json' },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
  } catch {
    // fetch only rejects when no answer arrived at all; status 0 marks that for the UI.
    throw new ApiRequestError(0, { error: 'Cablewright could not reach the server. Check the connection and try again.' });
  }
  const data = await readBody(response);
  if (!response.ok) throw new ApiRequestError(response.status, data);
  return data as T;
}

/**
 * A multipart upload (a photo): the browser sets the Content-Type with its boundary, so none is given
 * here. Errors come back as for every other request.
 */
export async function apiUpload<T>(path: string, form: FormData): Promise<T> {
  let response: Response;
  try {
    response = await fetch(BASE_URL + path, { method: 'POST', credentials: 'include', headers: { Accept: 'application/json' }, body: form });
  } catch {
    throw new ApiRequestError(0, { error: 'Cablewright could not reach the server. Check the connection and try again.' });
  }
  const data = await readBody(response);
  if (!response.ok) throw new ApiRequestError(response.status, data);
  return data as T;
}

/** A file the server makes (CSV, workbook): the bytes as a Blob, errors as for every other request. */
export async function apiFile(path: string): Promise<Blob> {
  let response: Response;
  try {
    response = await fetch(BASE_URL + path, { method: 'GET', credentials: 'include' });
  } catch {
    throw new ApiRequestError(0, { error: 'Cablewright could not reach the server. Check the connection and try again.' });
  }
  if (!response.ok) throw new ApiRequestError(response.status, await readBody(response));
  return response.blob();
}

export const api = {
  get: <T>(path: string) => apiRequest<T>('GET', path),
  post: <T>(path: string, body?: unknown) => apiRequest<T>('POST', path, body ?? {}),
  patch: <T>(path: string, body: unknown) => apiRequest<T>('PATCH', path, body),
  delete: <T = void>(path: string) => apiRequest<T>('DELETE', path),
  upload: <T>(path: string, form: FormData) => apiUpload<T>(path, form),
  file: (path: string) => apiFile(path),
};

async function readBody(response: Response): Promise<unknown> {
  if (response.status === 204) return undefined;
  const text = await response.text();
  if (!text) return undefined;
  try {
    return JSON.parse(text);
  } catch {
    return text;
  }
}

function readErrorBody(body: unknown): Partial<ApiError> {
  if (typeof body !== 'object' || body === null) return {};
  const candidate = body as Record<string, unknown>;
  return {
    error: typeof candidate.error === 'string' ? candidate.error : undefined,
    issues: Array.isArray(candidate.issues) ? candidate.issues.filter(isIssue) : undefined,
  };
}

function isIssue(value: unknown): value is Issue {
  const v = value as Record<string, unknown> | null;
  return typeof v === 'object' && v !== null && typeof v.path === 'string' && typeof v.message === 'string';
}

function fallbackMessage(status: number): string {
  if (status === 401) return 'Please sign in.';
  if (status === 403) return 'Your role does not allow this.';
  if (status === 404) return 'That could not be found.';
  if (status === 429) return 'Too many attempts. Wait a minute and try again.';
  if (status >= 500) return 'The server had a problem. Try again in a moment.';
  return `The request failed (HTTP ${status}).`;
}
