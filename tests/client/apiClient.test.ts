import { afterEach, describe, expect, it, vi } from 'vitest';
import { z } from 'zod';
import { apiFetch, ApiError } from '@/lib/apiClient';
import { mockApi } from './testUtils';

afterEach(() => vi.unstubAllGlobals());

const pingSchema = z.object({ ok: z.boolean() });

describe('apiFetch', () => {
  it('sends the client header, cookies and a JSON body on every request', async () => {
    const fetchMock = mockApi({ 'POST /api/things': { status: 200, body: { ok: true } } });
    await apiFetch('/api/things', { method: 'POST', body: { a: 1 }, schema: pingSchema });
    const [, init] = fetchMock.mock.calls[0];
    expect(init?.headers).toMatchObject({ 'X-Slotwise-Client': '1', 'Content-Type': 'application/json' });
    expect(init?.credentials).toBe('same-origin');
    expect(init?.body).toBe('{"a":1}');
  });

  it('returns the validated body', async () => {
    mockApi({ 'GET /api/things': { status: 200, body: { ok: true, extra: 'dropped' } } });
    await expect(apiFetch('/api/things', { schema: pingSchema })).resolves.toEqual({ ok: true });
  });

  it('refuses a success body that does not match the schema instead of passing it on', async () => {
    mockApi({ 'GET /api/things': { status: 200, body: { ok: 'yes' } } });
    await expect(apiFetch('/api/things', { schema: pingSchema })).rejects.toMatchObject({ code: 'invalid_response', status: 200 });
  });

  it('turns an error body into an ApiError with code, message, fields and extra details', async () => {
    mockApi({
      'POST /api/designs/7/revisions': {
        status: 409,
        body: { error: { code: 'stale_revision', message: 'Someone saved a newer revision.', fields: { baseRevision: 'Out of date' }, latestRevision: 12 } },
      },
    });
    const error = await apiFetch('/api/designs/7/revisions', { method: 'POST', body: {} }).catch((caught: unknown) => caught);
    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({ status: 409, code: 'stale_revision', message: 'Someone saved a newer revision.', fields: { baseRevision: 'Out of date' } });
    expect((error as ApiError).latestRevision).toBe(12);
  });

  it('gives a readable message when the error body is not JSON', async () => {
    vi.stubGlobal('fetch', vi.fn(async () => new Response('<html>Bad gateway</html>', { status: 502 })));
    await expect(apiFetch('/api/things')).rejects.toMatchObject({ status: 502, code: 'http_502', message: expect.stringMatching(/try again/i) });
  });

  it('reports an unreachable server as a network error', async () => {
    vi.stubGlobal('fetch', vi.fn(async () => Promise.reject(new TypeError('Failed to fetch'))));
    await expect(apiFetch('/api/things')).rejects.toMatchObject({ status: 0, code: 'network' });
  });

  it('resolves to nothing for 204 answers when no schema is given', async () => {
    mockApi({ 'DELETE /api/designs/3': { status: 204 } });
    await expect(apiFetch('/api/designs/3', { method: 'DELETE' })).resolves.toBeUndefined();
  });
});
