import fc from 'fast-check';
import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { sequelize } from '../../server/db/sequelize.ts';
import { insertWorkshopWithCrew } from '../factories/people.ts';
import { apiRoutes, type ApiRoute } from '../support/route-table.ts';
import { browser, startApp, type Browser, type TestApp } from '../support/test-app.ts';

// Property-based fuzzing of every route (ASVS V2: validation): random and
// adversarial parameters, queries and bodies, sent by a signed-in admin of
// the workshop. The answer is never a 5xx; a 4xx is JSON naming the problem
// and leaves the database as it was.

const ADVERSARIAL_STRINGS = ['', ' ', '../../etc/passwd', '%00', '<script>alert(1)</script>', "'; DROP TABLE heats; --", '__proto__', 'constructor', '9'.repeat(400), '-1', 'NaN', 'null', '😀'];
const text = fc.oneof(fc.string({ maxLength: 40 }), fc.constantFrom(...ADVERSARIAL_STRINGS));
const idLike = fc.oneof(fc.uuid(), text);
const body = fc.oneof(
  fc.jsonValue({ maxDepth: 3 }),
  fc.dictionary(fc.constantFrom('name', 'email', 'kind', 'role', 'alloy', 'x', 'y', 'csv', 'mapping', 'castingIds', 'pourTempC', '__proto__', 'constructor'), fc.jsonValue({ maxDepth: 2 })),
);
const query = fc.dictionary(fc.constantFrom('cursor', 'limit', 'from', 'to', 'kind', 'alloy', 'sort', 'casterId', 'targetC', 'state'), text, { maxKeys: 4 });

/** Rows in the tables a request could write, excluding bookkeeping (sessions, limits, jobs). */
async function tableCounts(): Promise<Record<string, number>> {
  const tables = await sequelize.query<{ name: string }>(
    `SELECT tablename AS name FROM pg_tables WHERE schemaname = 'public'
       AND tablename NOT IN ('sessions', 'rate_limits', 'schema_migrations', 'seed_runs', 'mail_deliveries', 'object_deletions')`,
    { type: QueryTypes.SELECT },
  );
  const counts: Record<string, number> = {};
  for (const { name } of tables) {
    const [{ n }] = await sequelize.query<{ n: number }>(`SELECT count(*)::int AS n FROM "${name}"`, { type: QueryTypes.SELECT });
    counts[name] = n;
  }
  return counts;
}

// Sign-in, sign-up and reset are fuzzed elsewhere with their limits in mind;
// here they would only trip the rate limits.
// Sign-out everywhere ends the fuzzing admin's own session, so it is left out
// too (tests/api/sessions.test.ts covers it).
const SKIP = new Set(['post /auth/sign-in', 'post /auth/sign-up', 'post /auth/password-reset', 'post /auth/sign-out', 'post /auth/sign-out-everywhere']);
const routes = apiRoutes().filter((r) => !SKIP.has(`${r.method} ${r.path}`));

let t: TestApp;
let admin: Browser;
let workshopId: string;
beforeAll(async () => {
  t = startApp();
  const crew = await insertWorkshopWithCrew();
  workshopId = crew.workshop.id;
  admin = await browser(t.app);
  await admin.signIn(crew.admin.email, crew.admin.password);
});
afterAll(() => t.close());

function fill(route: ApiRoute, ids: string[]): string {
  let i = 0;
  return `/api${route.path.replace(/:([A-Za-z]+)/g, (_m, name: string) =>
    name === 'workshopId' && i++ === 0 && ids.length % 2 === 0 ? workshopId : encodeURIComponent(ids[i++ % ids.length] ?? 'x'),
  )}`;
}

describe('every route under random input', () => {
  test.each(routes.map((r) => [`${r.method} ${r.path}`, r] as const))('when %s gets garbage, then never a 5xx', async (_name, route) => {
    await fc.assert(
      fc.asyncProperty(fc.array(idLike, { minLength: 1, maxLength: 4 }), query, body, async (ids, q, b) => {
        const before = await tableCounts();
        const url = fill(route, ids);
        let req = admin.agent[route.method](url).query(q);
        if (route.method !== 'get') req = req.set('x-csrf-token', admin.csrfToken);
        const res = route.method === 'get' ? await req : await req.set('content-type', 'application/json').send(JSON.stringify(b) ?? 'null');
        expect(res.status, `${route.method.toUpperCase()} ${url} → ${res.status} ${JSON.stringify(res.body).slice(0, 300)}`).toBeLessThan(500);
        if (res.status >= 400) {
          expect(res.headers['content-type']).toMatch(/json/);
          expect(typeof res.body.error?.code).toBe('string');
          expect(await tableCounts()).toEqual(before);
        }
      }),
      { numRuns: 12, seed: 20261201 },
    );
  });
});
