import { apiErrorSchema, type ErrorCode } from '@photon-ledger/shared';

/** Codes the client adds to the API's own: no answer arrived, or the answer was not in a known shape. */
export type ClientErrorCode = 'network_error' | 'unexpected_response';

/** A failed API request: the API's one error shape, or the client's failure to reach or read the API. */
export class ApiRequestError extends Error {
  override readonly name = 'ApiRequestError';
  /** HTTP status; 0 when no answer arrived. */
  readonly status: number;
  /** The API's error code, or a client code when the API could not be reached or understood. */
  readonly code: ErrorCode | ClientErrorCode;
  /** Field path (dot-separated) to the message for that field, for validation failures. */
  readonly fields: Readonly<Record<string, string>> | undefined;

  constructor(init: {
    status: number;
    code: ErrorCode | ClientErrorCode;
    message: string;
    fields?: Record<string, string> | undefined;
    cause?: unknown;
  }) {
    super(init.message, { cause: init.cause });
    this.status = init.status;
    this.code = init.code;
    this.fields = init.fields;
  }
}

/** What the client needs of a response schema: zod's `safeParse`, so every shared schema fits. */
export interface ResponseSchema<T> {
  safeParse(input: unknown):
    | { success: true; data: T }
    | { success: false; error: { issues: ReadonlyArray<{ path: ReadonlyArray<PropertyKey>; message: string }> } };
}

/** Options of one API request. */
export interface ApiRequestOptions {
  /** HTTP method; GET unless given. */
  method?: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  /** Sent as JSON, or as multipart/form-data when it is a FormData (uploads). */
  body?: unknown;
  /** Query parameters; undefined and empty values are left out. */
  query?: Record<string, string | undefined>;
  /** Cancels the request (TanStack Query passes one to every query function). */
  signal?: AbortSignal | undefined;
}

/** Calls the API on this origin and parses a success answer with `schema`; throws ApiRequestError otherwise. */
export async function apiRequest<T>(path: string, schema: ResponseSchema<T>, options: ApiRequestOptions = {}): Promise<T> {
  const response = await send(path, options);
  const body = await readJson(response);
  const parsed = schema.safeParse(body);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    const where = issue && issue.path.length > 0 ? issue.path.map(String).join('.') : '(root)';
    throw new ApiRequestError({
      status: response.status,
      code: 'unexpected_response',
      message: `The server's answer to ${path} was not understood: ${where}: ${issue?.message ?? 'invalid'}.`,
    });
  }
  return parsed.data;
}

/** Calls the API for an answer without a body (204); throws ApiRequestError on failure. */
export async function apiRequestNoContent(path: string, options: ApiRequestOptions = {}): Promise<void> {
  await send(path, options);
}

async function send(path: string, options: ApiRequestOptions): Promise<Response> {
  const headers: Record<string, string> = { Accept: 'application/json' };
  const multipart = options.body instanceof FormData;
  // For FormData the browser writes the Content-Type with its multipart boundary itself.
  if (options.body !== undefined && !multipart) headers['Content-Type'] = 'application/json';
  let response: Response;
  try {
    response = await fetch(withQuery(path, options.query), {
      method: options.method ?? 'GET',
      headers,
      body: options.body === undefined ? null : multipart ? (options.body as FormData) : JSON.stringify(options.body),
      // The session is an httpOnly cookie.
      credentials: 'include',
      signal: options.signal ?? null,
    });
  } catch (cause) {
    // Cancellation is TanStack Query's business, not an error to show.
    if (options.signal?.aborted) throw cause;
    throw new ApiRequestError({
      status: 0,
      code: 'network_error',
      message: 'Could not reach the Photon Ledger server. Check your connection and try again.',
      cause,
    });
  }
  if (!response.ok) throw await toRequestError(response);
  return response;
}

function withQuery(path: string, query: ApiRequestOptions['query']): string {
  if (!query) return path;
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) {
    if (value !== undefined && value !== '') params.set(key, value);
  }
  const text = params.toString();
  return text ? `${path}?${text}` : path;
}

async function readJson(response: Response): Promise<unknown> {
  try {
    return await response.json();
  } catch (cause) {
    throw new ApiRequestError({
      status: response.status,
      code: 'unexpected_response',
      message: `The server answered ${response.status} without a JSON body.`,
      cause,
    });
  }
}

async function toRequestError(response: Response): Promise<ApiRequestError> {
  let body: unknown;
  try {
    body = await response.json();
  } catch {
    body = undefined;
  }
  const parsed = apiErrorSchema.safeParse(body);
  if (parsed.success) {
    const { code, message, fields } = parsed.data.error;
    return new ApiRequestError({ status: response.status, code, message, fields });
  }
  return new ApiRequestError({
    status: response.status,
    code: 'unexpected_response',
    message: `The server answered ${response.status}${response.statusText ? ` ${response.statusText}` : ''}.`,
  });
}
