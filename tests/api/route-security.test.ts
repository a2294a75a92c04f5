import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { insertWorkshopWithCrew } from '../factories/people.ts';
import { apiRoutes, isStateChanging, urlFor, type ApiRoute } from '../support/route-table.ts';
import { browser, startApp, type Browser, type TestApp } from '../support/test-app.ts';

// Generated from the routers (tests/support/route-table.ts): every route the
// app mounts is called here, so a new route cannot ship without these checks.
// OWASP ASVS 5.0: V8 (authorization: tenant isolation), V3 (CSRF).

/**
 * Routes outside /workshops/:workshopId, each with the reason it is not
 * workshop-scoped. A new such route fails the test until it is listed here.
 */
const NOT_WORKSHOP_SCOPED: Record<string, string> = {
  'get /health': 'process liveness, public',
  'get /ready': 'readiness probe, public',
  'get /auth/me': 'the caller’s own session',
  'patch /auth/me': 'the caller’s own preferences',
  'post /auth/sign-up': 'public',
  'post /auth/sign-in': 'public',
  'post /auth/sign-out': 'the caller’s own session',
  'post /auth/sign-in/mfa': 'the caller’s own pending sign-in',
  'post /auth/sign-out-everywhere': 'the caller’s own sessions',
  'post /auth/password': 'the caller’s own password',
  'post /auth/mfa/setup': 'the caller’s own two-step sign-in',
  'post /auth/mfa/enable': 'the caller’s own two-step sign-in',
  'post /auth/mfa/disable': 'the caller’s own two-step sign-in',
  'post /auth/mfa/recovery-codes': 'the caller’s own recovery codes',
  'post /auth/password-reset': 'public, answers the same for any address',
  'post /auth/password-reset/confirm': 'bearer of a single-use token',
  'get /workshops': 'the caller’s own memberships',
  'post /workshops': 'creates a workshop the caller then runs',
  'get /invitations/:token': 'bearer of an invitation token',
  'post /invitations/:token/accept': 'bearer of an invitation token',
  'get /dev/mail': 'development only, admins of any workshop',
  'get /notifications': 'the caller’s own notifications',
  'post /notifications/:notificationId/read': 'the caller’s own notification',
  'post /notifications/read-all': 'the caller’s own notifications',
  'get /notification-preferences': 'the caller’s own preferences',
  'put /notification-preferences': 'the caller’s own preferences',
};

const key = (r: ApiRoute) => `${r.method} ${r.path}`;
const routes = apiRoutes();
const scoped = routes.filter((r) => r.path.includes(':workshopId'));

let t: TestApp;
let owner: Awaited<ReturnType<typeof insertWorkshopWithCrew>>;
let outsider: Browser;
let anonymous: Browser;
let member: Browser;
let missingWorkshopBody: unknown;

beforeAll(async () => {
  t = startApp();
  owner = await insertWorkshopWithCrew();
  const elsewhere = await insertWorkshopWithCrew();
  outsider = await browser(t.app);
  await outsider.signIn(elsewhere.admin.email, elsewhere.admin.password);
  anonymous = await browser(t.app);
  member = await browser(t.app);
  await member.signIn(owner.admin.email, owner.admin.password);
  missingWorkshopBody = (await outsider.get(`/api/workshops/${crypto.randomUUID()}/members`)).body;
});
afterAll(() => t.close());

describe('the route table', () => {
  test('when a route is not under /workshops/:workshopId, then it is listed with the reason', () => {
    const unlisted = routes.filter((r) => !r.path.includes(':workshopId') && !(key(r) in NOT_WORKSHOP_SCOPED)).map(key);
    expect(unlisted).toEqual([]);
  });
});

describe('tenant isolation (ASVS V8)', () => {
  test.each(scoped.map((r) => [key(r), r] as const))(
    'when an admin of another workshop calls %s, then 404 exactly like a missing workshop',
    async (_name, route) => {
      const res = await outsider.send(route.method, urlFor(route, owner.workshop.id), route.method === 'get' || route.method === 'delete' ? undefined : {});
      expect(res.status).toBe(404);
      expect(res.body).toEqual(missingWorkshopBody);
    },
  );

  test.each(scoped.map((r) => [key(r), r] as const))('when nobody is signed in and calls %s, then 401', async (_name, route) => {
    const res = await anonymous.send(route.method, urlFor(route, owner.workshop.id), route.method === 'get' || route.method === 'delete' ? undefined : {});
    expect(res.status).toBe(401);
  });
});

describe('CSRF (ASVS V3)', () => {
  test.each(routes.filter(isStateChanging).map((r) => [key(r), r] as const))(
    'when %s comes without the session’s token, then 403 csrf-invalid',
    async (_name, route) => {
      const res = await member.agent[route.method](urlFor(route, owner.workshop.id)).send({});
      expect(res.status).toBe(403);
      expect(res.body.error.code).toBe('csrf-invalid');
    },
  );
});
