import { afterEach, describe, expect, it, vi } from 'vitest';
import { jsonResponse } from '../test/render';
import { ApiError, apiBinary, apiJson, setUnauthorizedHandler } from './api-client';
import { getToken, setToken } from './auth-token';

describe('api-client', () => {
  afterEach(() => {
    vi.unstubAllGlobals();
    setUnauthorizedHandler(() => {});
  });

  it('apiJson sends the stored bearer token under /api and returns the JSON body', async () => {
    setToken('t-1');
    const fetchMock = vi.fn(async () => jsonResponse(200, [{ id: 'a1' }]));
    vi.stubGlobal('fetch', fetchMock);
    await expect(apiJson('/assets')).resolves.toEqual([{ id: 'a1' }]);
    const [url, init] = fetchMock.mock.calls[0] as unknown as [string, RequestInit];
    expect(url).toBe('/api/assets');
    expect(new Headers(init.headers).get('Authorization')).toBe('Bearer t-1');
  });

  it("apiJson throws an ApiError with the server's message, a list joined", async () => {
    setToken('t-1');
    vi.stubGlobal('fetch', vi.fn(async () => jsonResponse(400, { statusCode: 400, message: ['name must not be empty', 'uwi is too long'], error: 'Bad Request' })));
    const error = await apiJson('/assets/a1/wells', { method: 'POST', json: {} }).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiError);
    expect((error as ApiError).status).toBe(400);
    expect((error as ApiError).message).toBe('name must not be empty; uwi is too long');
  });

  it('a 401 on an authenticated request forgets the token and calls the unauthorized handler', async () => {
    setToken('expired');
    const handler = vi.fn();
    setUnauthorizedHandler(handler);
    vi.stubGlobal('fetch', vi.fn(async () => jsonResponse(401, { statusCode: 401, message: 'Unauthorized' })));
    await expect(apiJson('/auth/me')).rejects.toMatchObject({ status: 401 });
    expect(getToken()).toBeNull();
    expect(handler).toHaveBeenCalledTimes(1);
  });

  it('a 401 on a request sent without a token (login) leaves the session alone', async () => {
    setToken('still-here');
    const handler = vi.fn();
    setUnauthorizedHandler(handler);
    vi.stubGlobal('fetch', vi.fn(async () => jsonResponse(401, { statusCode: 401, message: 'Wrong password' })));
    await expect(apiJson('/auth/login', { method: 'POST', json: {}, auth: false })).rejects.toThrow('Wrong password');
    expect(handler).not.toHaveBeenCalled();
    expect(getToken()).toBe('still-here');
  });

  it('apiBinary returns the raw bytes', async () => {
    vi.stubGlobal('fetch', vi.fn(async () => new Response(new Uint8Array([80, 76, 67, 66]), { status: 200 })));
    const bytes = new Uint8Array(await apiBinary('/x'));
    expect(Array.from(bytes)).toEqual([80, 76, 67, 66]);
  });
});
