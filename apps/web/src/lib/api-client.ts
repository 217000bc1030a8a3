// The one way the client talks to the API: JSON over fetch, uploads over XMLHttpRequest
// (fetch cannot report upload progress). Every failure becomes an ApiError.
// Writes are same-origin requests (the browser adds `Sec-Fetch-Site: same-origin`, which the API's
// cross-site guard requires) and carry their body as application/json (the API answers 415 otherwise).
import type { ApiError as ApiErrorBody } from '@railyard/shared';

const apiBase = '/api';

/** One problem the API attached to a rejected request (`details.issues`). */
export type ApiIssue = { field: string | null; message: string };

export class ApiError extends Error {
  constructor(
    /** HTTP status; 0 when no answer came back at all. */
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details?: unknown,
  ) {
    super(message);
    this.name = 'ApiError';
  }

  /** Field-level problems from a validation error, when the API sent any. */
  get issues(): ApiIssue[] {
    const issues = (this.details as { issues?: unknown } | undefined)?.issues;
    if (!Array.isArray(issues)) return [];
    return issues.flatMap((issue: unknown) => {
      if (typeof issue !== 'object' || issue === null) return [];
      const { field, message } = issue as { field?: unknown; message?: unknown };
      if (typeof message !== 'string') return [];
      return [{ field: typeof field === 'string' ? field : null, message }];
    });
  }

  /**
   * Messages by the request field they belong to: the field a refusal names (`details.field`, e.g.
   * an unknown net in `to`) and every validation issue with a field. The first message per field wins.
   */
  get fieldErrors(): Partial<Record<string, string>> {
    const errors: Partial<Record<string, string>> = {};
    const named = (this.details as { field?: unknown } | undefined)?.field;
    if (typeof named === 'string' && named !== '') errors[named] = this.message;
    for (const issue of this.issues) {
      if (issue.field !== null) errors[issue.field] ??= issue.message;
    }
    return errors;
  }
}

export function isApiError(error: unknown): error is ApiError {
  return error instanceof ApiError;
}

function isErrorBody(body: unknown): body is ApiErrorBody {
  if (typeof body !== 'object' || body === null) return false;
  const error = (body as { error?: unknown }).error;
  return (
    typeof error === 'object' &&
    error !== null &&
    typeof (error as { code?: unknown }).code === 'string' &&
    typeof (error as { message?: unknown }).message === 'string'
  );
}

/** Builds the ApiError for a non-2xx answer, whether or not it carries the API's error shape. */
function errorFromResponse(status: number, statusText: string, body: unknown): ApiError {
  if (isErrorBody(body)) {
    return new ApiError(status, body.error.code, body.error.message, body.error.details);
  }
  // A proxy or a crashed server answers with HTML or nothing at all.
  const message =
    status === 502 || status === 503 || status === 504
      ? 'The Railyard API is not reachable right now'
      : `The API answered ${status}${statusText ? ` ${statusText}` : ''}`;
  return new ApiError(status, 'http_error', message);
}

function parseJson(text: string): unknown {
  if (text === '') return undefined;
  try {
    return JSON.parse(text);
  } catch {
    return undefined;
  }
}

export type QueryParams = Record<string, string | number | undefined>;

function url(path: string, params?: QueryParams): string {
  const search = new URLSearchParams();
  for (const [key, value] of Object.entries(params ?? {})) {
    if (value !== undefined) search.set(key, String(value));
  }
  const query = search.toString();
  return `${apiBase}${path}${query ? `?${query}` : ''}`;
}

type RequestOptions = { params?: QueryParams; signal?: AbortSignal };

async function request<T>(method: string, path: string, init: RequestInit & RequestOptions) {
  const { params, ...rest } = init;
  let response: Response;
  try {
    response = await fetch(url(path, params), {
      ...rest,
      method,
      // Explicit, though it is fetch's default: the session cookie goes only to this origin.
      credentials: 'same-origin',
    });
  } catch (error) {
    if (error instanceof DOMException && error.name === 'AbortError') throw error;
    throw new ApiError(0, 'network_error', 'Could not reach the Railyard API');
  }
  const body = parseJson(await response.text());
  if (!response.ok) throw errorFromResponse(response.status, response.statusText, body);
  return body as T;
}

function get<T>(path: string, options: RequestOptions = {}): Promise<T> {
  return request<T>('GET', path, { ...options, headers: { Accept: 'application/json' } });
}

/** A state-changing request; `body`, when given, is sent as JSON. A 204 resolves to undefined. */
function send<T>(
  method: 'POST' | 'PUT' | 'PATCH' | 'DELETE',
  path: string,
  body?: unknown,
  options: RequestOptions = {},
): Promise<T> {
  const headers: Record<string, string> = { Accept: 'application/json' };
  if (body !== undefined) headers['Content-Type'] = 'application/json';
  return request<T>(method, path, {
    ...options,
    headers,
    body: body === undefined ? undefined : JSON.stringify(body),
  });
}

export type UploadProgress = { loaded: number; total: number };

/** POSTs multipart form data and reports bytes sent as they leave the browser. */
function upload<T>(
  path: string,
  form: FormData,
  options: { onUploadProgress?: (progress: UploadProgress) => void; signal?: AbortSignal } = {},
): Promise<T> {
  return new Promise<T>((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', url(path));
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable) {
        options.onUploadProgress?.({ loaded: event.loaded, total: event.total });
      }
    };
    xhr.onload = () => {
      const body = parseJson(xhr.responseText);
      if (xhr.status >= 200 && xhr.status < 300) resolve(body as T);
      else reject(errorFromResponse(xhr.status, xhr.statusText, body));
    };
    xhr.onerror = () =>
      reject(new ApiError(0, 'network_error', 'The upload did not reach the API'));
    xhr.onabort = () => reject(new DOMException('The upload was cancelled', 'AbortError'));
    options.signal?.addEventListener('abort', () => xhr.abort(), { once: true });
    xhr.send(form);
  });
}

export const api = {
  get,
  post: <T>(path: string, body?: unknown, options?: RequestOptions) =>
    send<T>('POST', path, body, options),
  put: <T>(path: string, body?: unknown, options?: RequestOptions) =>
    send<T>('PUT', path, body, options),
  patch: <T>(path: string, body?: unknown, options?: RequestOptions) =>
    send<T>('PATCH', path, body, options),
  delete: <T = void>(path: string, options?: RequestOptions) =>
    send<T>('DELETE', path, undefined, options),
  upload,
};
