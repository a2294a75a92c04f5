import { expect, test } from '@playwright/test';
import { DEMO_LOG_SEED, buildDemoLog } from '../../seeders/demo-log.ts';
import { DEMO_PASSWORD, DEMO_PEOPLE } from '../../seeders/demo-people.ts';
import { rng } from '../../seeders/photo-generator.ts';

// `npm test` seeds the browser tests' database twice; the demo must be there once.
test.describe('the demo workshop', () => {
  test('when every demo account signs in, then each lands in the one demo workshop with its role', async ({ request }) => {
    for (const person of DEMO_PEOPLE) {
      const me = await request.get('/api/auth/me');
      const { csrfToken } = await me.json();
      const res = await request.post('/api/auth/sign-in', {
        data: { email: person.email, password: DEMO_PASSWORD },
        headers: { 'x-csrf-token': csrfToken },
      });
      expect(res.status(), person.email).toBe(200);
      const body = await res.json();
      expect(body.user.memberships.map((m: { role: string }) => m.role)).toEqual([person.role]);
      await request.post('/api/auth/sign-out', { headers: { 'x-csrf-token': body.csrfToken } });
    }
  });

  test('when the seed has run twice, then the log holds each demo heat once', async ({ request }) => {
    const admin = DEMO_PEOPLE.find((p) => p.role === 'admin')!;
    const { csrfToken } = await (await request.get('/api/auth/me')).json();
    const signIn = await (await request.post('/api/auth/sign-in', { data: { email: admin.email, password: DEMO_PASSWORD }, headers: { 'x-csrf-token': csrfToken } })).json();
    const workshopId = signIn.user.memberships[0].workshopId;
    let cursor: string | null = null;
    let heats = 0;
    do {
      const page = await (await request.get(`/api/workshops/${workshopId}/heats?limit=100${cursor ? `&cursor=${cursor}` : ''}`)).json();
      heats += page.items.length;
      cursor = page.nextCursor;
    } while (cursor);
    expect(heats).toBe(buildDemoLog(rng(DEMO_LOG_SEED)).length);
    const workshops = await (await request.get('/api/workshops')).json();
    expect(workshops).toHaveLength(1);
  });
});
