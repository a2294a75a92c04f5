import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { notificationPageSchema, notificationSchema } from '../../shared/reports/notification-schemas.ts';
import { sequelize } from '../../server/db/sequelize.ts';
import { runNotificationDigest } from '../../server/modules/notifications/notifications-service.ts';
import { assignMentor, insertWorkshopWithCrew } from '../factories/people.ts';
import { insertReport } from '../factories/reports.ts';
import { linkIn, mailsTo, waitForMail } from '../support/mail.ts';
import { browser, startApp, type TestApp } from '../support/test-app.ts';

let t: TestApp;
beforeAll(() => {
  t = startApp();
});
afterAll(() => t.close());

async function signedIn(user: { email: string; password: string }) {
  const b = await browser(t.app);
  await b.signIn(user.email, user.password);
  return b;
}

async function setUp() {
  const crew = await insertWorkshopWithCrew();
  await assignMentor(crew.workshop.id, crew.mentor.id, crew.student.id);
  return { ...crew, ws: crew.workshop.id };
}

/** The student submits a fresh report; its mentor is notified. */
async function submitReport(s: Awaited<ReturnType<typeof setUp>>, title: string) {
  const report = await insertReport({ workshopId: s.ws, authorId: s.student.id, title });
  const b = await signedIn(s.student);
  const res = await b.post(`/api/workshops/${s.ws}/reports/${report.id}/transitions`, { action: 'submit' });
  expect(res.status).toBe(200);
  return report;
}

const pause = (ms: number) => new Promise((r) => setTimeout(r, ms));

describe('GET /api/notifications', () => {
  test('when a mentor has two notifications, then they come newest first with the unread count, and reading them lowers it', async () => {
    // Arrange
    const s = await setUp();
    const older = await submitReport(s, 'Older question');
    const newer = await submitReport(s, 'Newer question');
    const mentor = await signedIn(s.mentor);

    // Act
    const list = notificationPageSchema.parse((await mentor.get('/api/notifications')).body);
    const read = await mentor.post(`/api/notifications/${list.items[0].id}/read`);
    const afterOne = notificationPageSchema.parse((await mentor.get('/api/notifications')).body);
    const unreadOnly = notificationPageSchema.parse((await mentor.get('/api/notifications?unread=true')).body);
    const all = await mentor.post('/api/notifications/read-all');
    const afterAll_ = notificationPageSchema.parse((await mentor.get('/api/notifications')).body);

    // Assert
    expect(list.items.map((n) => [n.reportId, n.kind])).toEqual([
      [newer.id, 'report_submitted'],
      [older.id, 'report_submitted'],
    ]);
    expect(list.items[0]).toMatchObject({ workshopId: s.ws, workshopName: s.workshop.name, link: `/w/${s.ws}/reports/${newer.id}`, actorId: s.student.id, readAt: null });
    expect(list.unreadCount).toBe(2);
    expect(read.status).toBe(200);
    expect(notificationSchema.parse(read.body).readAt).not.toBeNull();
    expect(afterOne.unreadCount).toBe(1);
    expect(unreadOnly.items.map((n) => n.reportId)).toEqual([older.id]);
    expect(all.body).toEqual({ updated: 1 });
    expect(afterAll_.unreadCount).toBe(0);
  });

  test('when the list is paged, then the cursor continues where the first page ended', async () => {
    const s = await setUp();
    for (const title of ['One', 'Two', 'Three']) await submitReport(s, title);
    const mentor = await signedIn(s.mentor);

    const first = notificationPageSchema.parse((await mentor.get('/api/notifications?limit=2')).body);
    const second = notificationPageSchema.parse((await mentor.get(`/api/notifications?limit=2&cursor=${first.nextCursor}`)).body);

    expect(first.items).toHaveLength(2);
    expect(second.items).toHaveLength(1);
    expect(second.nextCursor).toBeNull();
    expect(new Set([...first.items, ...second.items].map((n) => n.id)).size).toBe(3);
  });

  test.each([
    ['someone else’s notification', 'other', 404],
    ['a malformed id', 'malformed', 400],
  ] as const)('when marking %s read, then %i', async (_what, kind, status) => {
    const s = await setUp();
    await submitReport(s, 'Somebody else’s');
    const mentorsId = (await sequelize.query<{ id: string }>('SELECT id FROM notifications WHERE user_id = :userId', { replacements: { userId: s.mentor.id }, type: QueryTypes.SELECT }))[0].id;
    const b = await signedIn(s.caster);

    const res = await b.post(`/api/notifications/${kind === 'other' ? mentorsId : 'not-a-uuid'}/read`);

    expect(res.status).toBe(status);
  });

  test('when nobody is signed in, then 401', async () => {
    const b = await browser(t.app);

    const res = await b.get('/api/notifications');

    expect(res.status).toBe(401);
  });
});

describe('GET/PUT /api/notification-preferences', () => {
  test('when nothing was chosen, then mail is immediate; a bad choice answers 400 naming email', async () => {
    const s = await setUp();
    const b = await signedIn(s.mentor);

    const initial = await b.get('/api/notification-preferences');
    const bad = await b.send('put', '/api/notification-preferences', { email: 'hourly' });

    expect(initial.body).toEqual({ email: 'immediate' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues[0].path).toBe('email');
  });

  test('when a mentor picks the daily digest, then a submit mails nothing at once and the digest mails it once with the link', async () => {
    // Arrange
    const s = await setUp();
    const mentor = await signedIn(s.mentor);
    const chosen = await mentor.send('put', '/api/notification-preferences', { email: 'daily' });

    // Act
    const report = await submitReport(s, 'Waiting for the digest');
    await pause(2_000);
    const before = mailsTo(s.mentor.email).length;
    await runNotificationDigest();
    const digest = await waitForMail(s.mentor.email, (m) => m.subject.includes('update'));
    await runNotificationDigest();
    await pause(1_500);

    // Assert
    expect(chosen.body).toEqual({ email: 'daily' });
    expect(before).toBe(0);
    expect(digest.text).toContain('Waiting for the digest');
    expect(linkIn(digest, `/w/${s.ws}/reports/${report.id}`)).toBeTruthy();
    expect(mailsTo(s.mentor.email)).toHaveLength(1);
    // The in-app notification is there all along.
    expect(notificationPageSchema.parse((await mentor.get('/api/notifications')).body).unreadCount).toBe(1);
  });

  test('when a mentor turns mail off, then the notification is in the app only and the digest sends nothing', async () => {
    const s = await setUp();
    const mentor = await signedIn(s.mentor);
    await mentor.send('put', '/api/notification-preferences', { email: 'off' });

    await submitReport(s, 'Quiet please');
    await runNotificationDigest();
    await pause(2_000);

    expect(mailsTo(s.mentor.email)).toHaveLength(0);
    expect(notificationPageSchema.parse((await mentor.get('/api/notifications')).body).items).toHaveLength(1);
  });
});

describe('the notification digest job', () => {
  test('when an immediate mail could not be queued, then the in-app notification stays and the next digest sends it', async () => {
    // Arrange: a notification whose mail was never queued, as after a queue failure.
    const s = await setUp();
    const report = await insertReport({ workshopId: s.ws, authorId: s.student.id, state: 'submitted', title: 'Lost in the queue' });
    await sequelize.query(
      `INSERT INTO notifications (id, user_id, workshop_id, kind, report_id, actor_id, title, body, link, mail, created_at)
       VALUES (gen_random_uuid(), :userId, :ws, 'report_submitted', :reportId, :actorId, 'Someone asks about “Lost in the queue”', '', :link, 'immediate', now() - interval '1 hour')`,
      { replacements: { userId: s.mentor.id, ws: s.ws, reportId: report.id, actorId: s.student.id, link: `/w/${s.ws}/reports/${report.id}` } },
    );

    // Act
    const result = await runNotificationDigest();
    const mail = await waitForMail(s.mentor.email, (m) => m.text.includes('Lost in the queue'));

    // Assert
    expect(result.notifications).toBeGreaterThanOrEqual(1);
    expect(linkIn(mail, `/w/${s.ws}/reports/${report.id}`)).toBeTruthy();
    const [row] = await sequelize.query<{ mailed_at: Date | null }>('SELECT mailed_at FROM notifications WHERE user_id = :userId', {
      replacements: { userId: s.mentor.id },
      type: QueryTypes.SELECT,
    });
    expect(row.mailed_at).not.toBeNull();
  });
});
