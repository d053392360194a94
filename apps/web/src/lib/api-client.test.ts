import { afterEach, describe, expect, it, vi } from 'vitest';
import { meResponseSchema } from '@photon-ledger/shared';
import { ApiRequestError, apiRequest, apiRequestNoContent } from './api-client';

function jsonResponse(status: number, body: unknown): Response {
  return new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });
}

async function caught(promise: Promise<unknown>): Promise<ApiRequestError> {
  const error = await promise.then(
    () => undefined,
    (reason: unknown) => reason,
  );
  if (!(error instanceof ApiRequestError)) throw new Error(`expected an ApiRequestError, got ${String(error)}`);
  return error;
}

afterEach(() => {
  vi.unstubAllGlobals();
});

describe('apiRequest', () => {
  it('turns the API error shape into an ApiRequestError with status, code, message and fields', async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn(async () =>
        jsonResponse(400, {
          error: {
            code: 'validation_failed',
            message: 'the request body is not valid',
            fields: { email: 'email must be an e-mail address, e.g. name@example.org' },
          },
        }),
      ),
    );

    const error = await caught(apiRequest('/api/auth/login', meResponseSchema, { method: 'POST', body: {} }));

    expect(error.status).toBe(400);
    expect(error.code).toBe('validation_failed');
    expect(error.message).toBe('the request body is not valid');
    expect(error.fields).toEqual({ email: 'email must be an e-mail address, e.g. name@example.org' });
  });

  it('sends the session cookie and JSON, and leaves empty query values out', async () => {
    const fetchMock = vi.fn(async (_input: RequestInfo | URL, _init?: RequestInit) => new Response(null, { status: 204 }));
    vi.stubGlobal('fetch', fetchMock);

    await apiRequestNoContent('/api/things', { method: 'POST', body: { a: 1 }, query: { regime: 'heliocentric', q: '' } });

    const [url, init] = fetchMock.mock.calls[0] ?? [];
    expect(url).toBe('/api/things?regime=heliocentric');
    expect(init?.credentials).toBe('include');
    expect(init?.body).toBe('{"a":1}');
  });

  it('sends a FormData body as multipart, leaving the Content-Type (with its boundary) to the browser', async () => {
    const fetchMock = vi.fn(async (_input: RequestInfo | URL, _init?: RequestInit) => jsonResponse(201, { user: { id: '6f1c1f4e-6a43-4f38-9c39-3f0b3c3a2b11', email: 'a@b.example', displayName: 'A', role: 'engineer' } }));
    vi.stubGlobal('fetch', fetchMock);
    const form = new FormData();
    form.set('file', new Blob(['a,b\n1,2\n'], { type: 'text/csv' }), 'x.csv');

    await apiRequest('/api/uploads', meResponseSchema, { method: 'POST', body: form });

    const init = fetchMock.mock.calls[0]?.[1];
    expect(init?.body).toBe(form);
    expect((init?.headers as Record<string, string>)['Content-Type']).toBeUndefined();
  });

  it('reports a success answer that does not match the schema as unexpected_response, naming the field', async () => {
    vi.stubGlobal('fetch', vi.fn(async () => jsonResponse(200, { user: { id: 'not-a-uuid' } })));

    const error = await caught(apiRequest('/api/me', meResponseSchema));

    expect(error.code).toBe('unexpected_response');
    expect(error.message).toContain('user.id');
  });

  it('reports an unreachable server as network_error with status 0', async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn(async () => {
        throw new TypeError('fetch failed');
      }),
    );

    const error = await caught(apiRequest('/api/me', meResponseSchema));

    expect(error.status).toBe(0);
    expect(error.code).toBe('network_error');
  });

  it('keeps the status of an error answer that is not in the API shape', async () => {
    vi.stubGlobal('fetch', vi.fn(async () => new Response('<html>Bad gateway</html>', { status: 502 })));

    const error = await caught(apiRequest('/api/me', meResponseSchema));

    expect(error.status).toBe(502);
    expect(error.code).toBe('unexpected_response');
  });
});
