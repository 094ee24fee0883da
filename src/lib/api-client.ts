import type { ApiErrorBody } from '@shared/schemas/api-error';

/** An error answer from the API, with the server's code and per-field reasons. */
export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly fields: Record<string, string>;
  readonly details: Record<string, unknown>;

  constructor(status: number, body: ApiErrorBody['error']) {
    super(body.message);
    this.name = 'ApiError';
    this.status = status;
    this.code = body.code;
    const { code: _code, message: _message, fields, ...details } = body;
    this.fields = fields ?? {};
    this.details = details;
  }
}

interface RequestOptions {
  method?: 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';
  body?: unknown;
  signal?: AbortSignal;
}

/** Calls `/api/...`; returns the parsed JSON, or throws ApiError (or a network error). */
export async function apiRequest<T>(path: string, options: RequestOptions = {}): Promise<T> {
  // A FormData body (a file upload) goes as multipart; the browser sets its own Content-Type.
  const form = options.body instanceof FormData;
  const sendsJson = options.body !== undefined && !form;
  const response = await fetch(`/api${path}`, {
    method: options.method ?? 'GET',
    headers: sendsJson
      ? { Accept: 'application/json', 'Content-Type': 'application/json' }
      : { Accept: 'application/json' },
    body: form ? (options.body as FormData) : sendsJson ? JSON.stringify(options.body) : undefined,
    credentials: 'same-origin',
    signal: options.signal,
  });
  if (response.status === 204) return undefined as T;
  const json = parseJson(await response.text());
  if (!response.ok) {
    const body = (json as Partial<ApiErrorBody> | undefined)?.error;
    throw new ApiError(
      response.status,
      body ?? { code: 'http_error', message: `The server answered ${response.status}` },
    );
  }
  return json as T;
}

/** A proxy in front of the app may answer with a page instead of JSON. */
function parseJson(text: string): unknown {
  try {
    return text ? (JSON.parse(text) as unknown) : undefined;
  } catch {
    return undefined;
  }
}

export function isApiError(error: unknown, status?: number): error is ApiError {
  return error instanceof ApiError && (status === undefined || error.status === status);
}

/** A sentence for any error, for places that show one message. */
export function errorMessage(error: unknown): string {
  if (error instanceof ApiError) return error.message;
  if (error instanceof TypeError) return 'Could not reach the server; check the connection and try again';
  return error instanceof Error ? error.message : 'Something went wrong';
}
