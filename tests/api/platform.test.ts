import request from 'supertest';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { browser, startApp, type TestApp } from '../support/test-app.ts';

let t: TestApp;
beforeAll(() => {
  t = startApp();
});
afterAll(() => t.close());

describe('health and readiness', () => {
  test('when the database and the storage fake are up, then /api/health and /api/ready answer 200', async () => {
    const health = await request(t.app).get('/api/health');
    const ready = await request(t.app).get('/api/ready');

    expect(health.body).toEqual({ status: 'ok' });
    expect(ready.status).toBe(200);
    expect(ready.body.checks).toEqual({ database: 'ok', storage: 'ok' });
  });
});

describe('client mistakes', () => {
  test('when an API route does not exist, then a JSON 404', async () => {
    const res = await request(t.app).get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(res.headers['content-type']).toMatch(/json/);
    expect(res.body.error.code).toBe('route-not-found');
  });

  test('when the body is not JSON, then 400 malformed-json, not a 500', async () => {
    const b = await browser(t.app);
    const res = await b.agent
      .post('/api/auth/sign-in')
      .set('x-csrf-token', b.csrfToken)
      .set('content-type', 'application/json')
      .send('{"email": ');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('malformed-json');
    expect(JSON.stringify(res.body)).not.toMatch(/at .*\.ts/);
  });

  test('when the body is too large, then 413', async () => {
    const b = await browser(t.app);
    const res = await b.post('/api/auth/sign-in', { email: 'a@example.test', password: 'x'.repeat(400_000) });
    expect(res.status).toBe(413);
  });
});

describe('security headers', () => {
  test('when any page is served, then a Content-Security-Policy, nosniff and frame-ancestors none are set', async () => {
    const res = await request(t.app).get('/api/health');
    const csp = res.headers['content-security-policy'];
    expect(csp).toContain("default-src 'self'");
    expect(csp).toContain("script-src 'self'");
    expect(csp).toContain("frame-ancestors 'none'");
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['x-powered-by']).toBeUndefined();
  });
});

describe('development outbox', () => {
  test('when a non-admin asks for the outbox, then 403; signed out 401', async () => {
    const anonymous = await (await browser(t.app)).get('/api/dev/mail');
    expect(anonymous.status).toBe(401);
  });
});
