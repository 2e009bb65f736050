import { afterEach, describe, expect, it, vi } from 'vitest';
import { api, ApiError } from './api-client';

afterEach(() => {
  vi.unstubAllGlobals();
});

const reply = (status: number, body: string | null, contentType = 'application/json') =>
  vi.fn(async () => new Response(body, { status, headers: { 'Content-Type': contentType } }));

describe('api client', () => {
  it('sends JSON with the session cookie of this site only', async () => {
    const fetchMock = reply(200, '{"ok":true}');
    vi.stubGlobal('fetch', fetchMock);

    await expect(api.post('/api/things', { name: 'Kittiwake' })).resolves.toEqual({ ok: true });
    const [path, init] = fetchMock.mock.calls[0] as unknown as [string, RequestInit];
    expect(path).toBe('/api/things');
    expect(init).toMatchObject({
      method: 'POST',
      credentials: 'same-origin',
      body: '{"name":"Kittiwake"}',
    });
    expect(init.headers).toMatchObject({ 'Content-Type': 'application/json' });
  });

  it('returns nothing for 204 No Content', async () => {
    vi.stubGlobal('fetch', reply(204, null));
    await expect(api.post('/api/auth/sign-out')).resolves.toBeUndefined();
  });

  it('throws the problem details, field errors included', async () => {
    const body = {
      type: 'about:blank',
      title: 'Bad request',
      status: 400,
      detail: 'Check the fields.',
      errors: [{ field: 'email', message: 'Enter an e-mail address.' }],
    };
    vi.stubGlobal('fetch', reply(400, JSON.stringify(body), 'application/problem+json'));

    const error = await api.get('/api/x').catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({
      status: 400,
      message: 'Check the fields.',
      fieldErrors: body.errors,
    });
  });

  it('describes an answer that is not problem JSON by its status', async () => {
    vi.stubGlobal('fetch', reply(502, '<html>Bad gateway</html>', 'text/html'));
    await expect(api.get('/api/x')).rejects.toMatchObject({
      status: 502,
      message: 'The server answered with status 502.',
    });
  });

  it('reports an unreachable server as a network error', async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn(async () => {
        throw new TypeError('Failed to fetch');
      }),
    );
    const error = (await api.get('/api/x').catch((e: unknown) => e)) as ApiError;
    expect(error.isNetworkError).toBe(true);
    expect(error.message).toMatch(/could not reach the server/i);
  });
});
