import { z } from 'zod';

/** The error body every Slotwise API route answers with on 4xx/5xx. */
const errorBodySchema = z.object({
  error: z
    .object({
      code: z.string(),
      message: z.string(),
      fields: z.record(z.string(), z.string()).optional(),
    })
    .loose(),
});

/** A failed API call: the server's code and message, plus per-field messages and any extra details (e.g. latestRevision). */
export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly fields: Record<string, string>;
  /** Everything else the server put in `error`, such as `latestRevision` on a stale save. */
  readonly details: Record<string, unknown>;

  constructor(init: { status: number; code: string; message: string; fields?: Record<string, string>; details?: Record<string, unknown> }) {
    super(init.message);
    this.name = 'ApiError';
    this.status = init.status;
    this.code = init.code;
    this.fields = init.fields ?? {};
    this.details = init.details ?? {};
  }

  /** The revision the server holds when a save was refused as stale (409 'stale_revision'). */
  get latestRevision(): number | undefined {
    const value = this.details.latestRevision;
    return typeof value === 'number' ? value : undefined;
  }
}

export function isApiError(error: unknown): error is ApiError {
  return error instanceof ApiError;
}

type Method = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

export interface ApiFetchOptions<S extends z.ZodType | undefined> {
  method?: Method;
  body?: unknown;
  signal?: AbortSignal;
  /** Validates the JSON response; without it the response body is ignored and the call resolves to undefined. */
  schema?: S;
}

type ApiResult<S> = S extends z.ZodType ? z.output<S> : void;

const GENERIC_FAILURE = 'Something went wrong on the server. Try again in a moment.';

/**
 * JSON fetch for /api: sends cookies and the X-Slotwise-Client header (the server's cross-site
 * request check), turns error bodies into ApiError and validates success bodies with the caller's schema.
 */
export async function apiFetch<S extends z.ZodType | undefined = undefined>(
  path: string,
  options: ApiFetchOptions<S> = {},
): Promise<ApiResult<S>> {
  const { method = 'GET', body, signal, schema } = options;
  const headers: Record<string, string> = { Accept: 'application/json', 'X-Slotwise-Client': '1' };
  // FormData (file uploads) sets its own multipart Content-Type with the boundary.
  const isForm = typeof FormData !== 'undefined' && body instanceof FormData;
  if (body !== undefined && !isForm) headers['Content-Type'] = 'application/json';

  let response: Response;
  try {
    response = await fetch(path, {
      method,
      headers,
      credentials: 'same-origin',
      body: body === undefined ? undefined : isForm ? (body as FormData) : JSON.stringify(body),
      signal,
    });
  } catch (cause) {
    if (signal?.aborted) throw cause;
    throw new ApiError({
      status: 0,
      code: 'network',
      message: 'Slotwise could not reach the server. Check your connection and try again.',
    });
  }

  if (!response.ok) throw await errorFromResponse(response);
  if (!schema) return undefined as ApiResult<S>;

  const json = await readJson(response);
  const parsed = schema.safeParse(json);
  if (!parsed.success) {
    throw new ApiError({
      status: response.status,
      code: 'invalid_response',
      message: 'The server sent an answer Slotwise did not expect. Reload the page; if it keeps happening, tell your administrator.',
      details: { issues: parsed.error.issues },
    });
  }
  return parsed.data as ApiResult<S>;
}

async function readJson(response: Response): Promise<unknown> {
  const text = await response.text();
  if (!text) return undefined;
  try {
    return JSON.parse(text);
  } catch {
    return undefined;
  }
}

async function errorFromResponse(response: Response): Promise<ApiError> {
  const parsed = errorBodySchema.safeParse(await readJson(response));
  if (!parsed.success) {
    return new ApiError({ status: response.status, code: `http_${response.status}`, message: GENERIC_FAILURE });
  }
  const { code, message, fields, ...details } = parsed.data.error;
  return new ApiError({ status: response.status, code, message, fields, details });
}
