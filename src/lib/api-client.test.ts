import { afterEach, describe, expect, test } from 'vitest';
import { apiError, json, stubApi } from '#src/testing/fetch-stub.ts';
import { ApiError, apiClient, setCsrfSource } from './api-client.ts';

afterEach(() => setCsrfSource(null));

describe('apiClient', () => {
  test('when the CSRF token is stale, then it fetches a fresh one once and retries with it', async () => {
    let token = 'old-token';
    setCsrfSource({
      get: () => token,
      refresh: async () => {
        token = 'fresh-token';
        return token;
      },
    });
    const api = stubApi({
      'POST /api/workshops': ({ headers }) =>
        headers.get('x-csrf-token') === 'fresh-token' ? json({ ok: true }, { status: 201 }) : apiError(403, 'csrf-invalid'),
    });

    await expect(apiClient.post('/workshops', { name: 'Shed' })).resolves.toEqual({ ok: true });
    expect(api.to('POST', '/api/workshops').map((r) => r.headers.get('x-csrf-token'))).toEqual(['old-token', 'fresh-token']);
  });

  test('when a request fails, then it throws an ApiError with the code, issues and Retry-After', async () => {
    stubApi({
      'POST /api/auth/sign-in': () =>
        apiError(429, 'rate-limited', 'Slow down', { issues: [{ path: 'email', message: 'x' }] }, { 'retry-after': '30' }),
    });

    const error = await apiClient.post('/auth/sign-in', {}).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({ status: 429, code: 'rate-limited', message: 'Slow down', retryAfterSeconds: 30, issues: [{ path: 'email', message: 'x' }] });
  });

  test('when the answer is 204, then it resolves with nothing and GETs send no CSRF header', async () => {
    setCsrfSource({ get: () => 't', refresh: async () => 't' });
    const api = stubApi({
      'POST /api/auth/sign-out': () => new Response(null, { status: 204 }),
      'GET /api/workshops': [],
    });

    await expect(apiClient.post('/auth/sign-out')).resolves.toBeUndefined();
    await apiClient.get('/workshops');
    expect(api.to('GET', '/api/workshops')[0]?.headers.get('x-csrf-token')).toBeNull();
  });
});
