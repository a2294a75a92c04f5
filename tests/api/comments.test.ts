import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { commentListSchema, commentSchema } from '../../shared/reports/comment-schemas.ts';
import { sequelize } from '../../server/db/sequelize.ts';
import { assignMentor, insertMember, insertWorkshopWithCrew } from '../factories/people.ts';
import { insertMarkedCasting, insertReport } from '../factories/reports.ts';
import { linkIn, waitForMail } from '../support/mail.ts';
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

/** A student's submitted report, their assigned mentor, a mentor they asked for, and an outsider student. */
async function setUp() {
  const crew = await insertWorkshopWithCrew();
  const ws = crew.workshop.id;
  const [requestedMentor, otherStudent] = await Promise.all([insertMember(ws, 'mentor'), insertMember(ws, 'student')]);
  await assignMentor(ws, crew.mentor.id, crew.student.id);
  const report = await insertReport({ workshopId: ws, authorId: crew.student.id, state: 'submitted', requestedMentorId: requestedMentor.id });
  const [markId] = await sequelize
    .query<{ id: string }>('SELECT m.id FROM marks m JOIN photos p ON p.id = m.photo_id WHERE p.casting_id = :castingId', {
      replacements: { castingId: report.castingId },
      type: QueryTypes.SELECT,
    })
    .then((rows) => rows.map((r) => r.id));
  const [photoId] = await sequelize
    .query<{ id: string }>('SELECT id FROM photos WHERE casting_id = :castingId', { replacements: { castingId: report.castingId }, type: QueryTypes.SELECT })
    .then((rows) => rows.map((r) => r.id));
  return { ...crew, ws, report, markId, photoId, requestedMentor, otherStudent, url: `/api/workshops/${ws}/reports/${report.id}/comments` };
}

async function notificationsOf(userId: string) {
  return sequelize.query<{ kind: string; comment_id: string | null }>(
    'SELECT kind, comment_id FROM notifications WHERE user_id = :userId ORDER BY created_at',
    { replacements: { userId }, type: QueryTypes.SELECT },
  );
}

describe('POST /api/workshops/:workshopId/reports/:reportId/comments', () => {
  test('when a comment holds raw HTML, then the raw text is kept and the HTML shows it as text, never as a tag', async () => {
    // Arrange
    const s = await setUp();
    const b = await signedIn(s.student);
    const body = 'Is this <img src=x onerror=alert(1)> **gas**?';

    // Act
    const res = await b.post(s.url, { body });

    // Assert
    expect(res.status).toBe(201);
    const comment = commentSchema.parse(res.body);
    expect(comment.body).toBe(body);
    expect(comment.html).not.toMatch(/<img/i);
    expect(comment.html).toContain('&lt;img src=x onerror=alert(1)&gt;');
    expect(comment.html).toContain('<strong>gas</strong>');
    const [row] = await sequelize.query<{ body: string }>('SELECT body FROM comments WHERE id = :id', { replacements: { id: comment.id }, type: QueryTypes.SELECT });
    expect(row.body).toBe(body);
  });

  test('when a comment links to javascript: and to https, then the first is dropped and the second gets rel="nofollow noopener"', async () => {
    const s = await setUp();
    const b = await signedIn(s.mentor);

    const res = await b.post(s.url, { body: '[click](javascript:alert(1)) or read [the guide](https://example.test/gas)' });

    expect(res.status).toBe(201);
    expect(res.body.html).not.toContain('href="javascript');
    expect(res.body.html).toContain('<a href="https://example.test/gas" rel="nofollow noopener">the guide</a>');
  });

  test('when a mentor answers a comment and pins it to a mark, then the thread and the anchor are kept in order', async () => {
    // Arrange
    const s = await setUp();
    const student = await signedIn(s.student);
    const mentor = await signedIn(s.mentor);
    const question = await student.post(s.url, { body: 'What is this cluster?' });

    // Act
    const answer = await mentor.post(s.url, { body: 'Hydrogen: see the round, shiny walls.', parentId: question.body.id, markId: s.markId });
    const list = await student.get(s.url);

    // Assert
    expect(answer.status).toBe(201);
    expect(answer.body).toMatchObject({ parentId: question.body.id, markId: s.markId, photoId: s.photoId, authorId: s.mentor.id });
    const items = commentListSchema.parse(list.body).items;
    expect(items.map((c) => [c.id, c.parentId])).toEqual([
      [question.body.id, null],
      [answer.body.id, question.body.id],
    ]);
  });

  test.each([
    ['a parent on another report', 'parentId'],
    ['a mark on another casting', 'markId'],
    ['an empty body', 'body'],
    ['an outsider picked for a mention', 'mentionIds'],
  ])('when the comment names %s, then 400 naming %s', async (what, path) => {
    // Arrange
    const s = await setUp();
    const other = await insertReport({ workshopId: s.ws, authorId: s.student.id, state: 'submitted' });
    const otherCasting = await insertMarkedCasting(s.ws, s.student.id);
    const b = await signedIn(s.student);
    const elsewhere = await b.post(`/api/workshops/${s.ws}/reports/${other.id}/comments`, { body: 'on the other report' });
    const body = {
      'a parent on another report': { body: 'reply', parentId: elsewhere.body.id },
      'a mark on another casting': { body: 'here', markId: otherCasting.markIds[0] },
      'an empty body': { body: '   ' },
      'an outsider picked for a mention': { body: 'look', mentionIds: [s.otherStudent.id] },
    }[what]!;

    // Act
    const res = await b.post(s.url, body);

    // Assert
    expect(res.status).toBe(400);
    expect(res.body.error.issues.map((i: { path: string }) => i.path)).toContain(path);
  });

  test('when someone who cannot read the report comments, then 404 and nothing is written', async () => {
    const s = await setUp();
    const b = await signedIn(s.otherStudent);

    const res = await b.post(s.url, { body: 'let me see' });

    expect(res.status).toBe(404);
    const [{ n }] = await sequelize.query<{ n: number }>('SELECT count(*)::int AS n FROM comments WHERE report_id = :id', {
      replacements: { id: s.report.id },
      type: QueryTypes.SELECT,
    });
    expect(n).toBe(0);
  });

  test('when a comment mentions one mentor by name and picks another, then both are told they were mentioned and an outsider named is not', async () => {
    // Arrange
    const s = await setUp();
    const b = await signedIn(s.student);

    // Act
    const res = await b.post(s.url, {
      body: `@${s.mentor.displayName} and @${s.otherStudent.displayName}, what do you think?`,
      mentionIds: [s.requestedMentor.id],
    });

    // Assert
    expect(res.status).toBe(201);
    expect(res.body.mentions.map((m: { userId: string }) => m.userId).sort()).toEqual([s.mentor.id, s.requestedMentor.id].sort());
    expect(await notificationsOf(s.mentor.id)).toEqual([{ kind: 'mentioned', comment_id: res.body.id }]);
    expect(await notificationsOf(s.requestedMentor.id)).toEqual([{ kind: 'mentioned', comment_id: res.body.id }]);
    expect(await notificationsOf(s.otherStudent.id)).toEqual([]);
  });

  test('when a mentor comments, then the author and earlier commenters get a mail linking to the report', async () => {
    // Arrange
    const s = await setUp();
    const admin = await signedIn(s.admin);
    await admin.post(s.url, { body: 'Following this one.' });
    const mentor = await signedIn(s.mentor);

    // Act
    const res = await mentor.post(s.url, { body: 'Check the degassing tablets were dry.' });
    const [toAuthor, toAdmin] = await Promise.all([
      waitForMail(s.student.email, (m) => m.text.includes('Check the degassing tablets were dry.')),
      waitForMail(s.admin.email, (m) => m.text.includes('Check the degassing tablets were dry.')),
    ]);

    // Assert
    expect(res.status).toBe(201);
    expect(toAuthor.subject).toContain('commented on');
    expect(new URL(linkIn(toAuthor, `/w/${s.ws}/reports/${s.report.id}`)).hash).toBe(`#comment-${res.body.id}`);
    expect(linkIn(toAdmin, `/w/${s.ws}/reports/${s.report.id}`)).toBeTruthy();
    // Nobody is told about their own comment.
    expect((await notificationsOf(s.mentor.id)).filter((n) => n.comment_id === res.body.id)).toEqual([]);
  });
});

describe('PATCH /api/workshops/:workshopId/comments/:commentId', () => {
  test('when the author edits within the window, then it changes; after 15 minutes, then 409 edit-window-closed', async () => {
    // Arrange
    const s = await setUp();
    const b = await signedIn(s.student);
    const created = await b.post(s.url, { body: 'first tyop' });
    const url = `/api/workshops/${s.ws}/comments/${created.body.id}`;

    // Act
    const edited = await b.patch(url, { body: 'first typo fixed' });
    await sequelize.query("UPDATE comments SET created_at = now() - interval '16 minutes' WHERE id = :id", { replacements: { id: created.body.id } });
    const late = await b.patch(url, { body: 'too late' });

    // Assert
    expect(edited.status).toBe(200);
    expect(edited.body).toMatchObject({ body: 'first typo fixed', html: '<p>first typo fixed</p>\n' });
    expect(edited.body.editedAt).not.toBeNull();
    expect(late.status).toBe(409);
    expect(late.body.error.code).toBe('edit-window-closed');
    const [row] = await sequelize.query<{ body: string }>('SELECT body FROM comments WHERE id = :id', { replacements: { id: created.body.id }, type: QueryTypes.SELECT });
    expect(row.body).toBe('first typo fixed');
  });

  test.each([
    ['a mentor edits the student’s comment', 'mentor', 403],
    ['an outsider edits it', 'otherStudent', 404],
  ] as const)('when %s, then %i', async (_what, who, status) => {
    const s = await setUp();
    const author = await signedIn(s.student);
    const created = await author.post(s.url, { body: 'mine' });
    const b = await signedIn(s[who]);

    const res = await b.patch(`/api/workshops/${s.ws}/comments/${created.body.id}`, { body: 'changed' });

    expect(res.status).toBe(status);
  });

  test('when an edit adds a mention, then only the newly mentioned member is told', async () => {
    const s = await setUp();
    const b = await signedIn(s.student);
    const created = await b.post(s.url, { body: 'question', mentionIds: [s.mentor.id] });

    await b.patch(`/api/workshops/${s.ws}/comments/${created.body.id}`, { body: 'question', mentionIds: [s.mentor.id, s.requestedMentor.id] });

    expect((await notificationsOf(s.mentor.id)).map((n) => n.kind)).toEqual(['mentioned']);
    expect((await notificationsOf(s.requestedMentor.id)).map((n) => n.kind)).toEqual(['comment_added', 'mentioned']);
  });
});

describe('GET /api/workshops/:workshopId/photos/:photoId/comments', () => {
  test('when comments are pinned to a photo’s marks, then readers of the report see them and others see none', async () => {
    // Arrange
    const s = await setUp();
    const mentor = await signedIn(s.mentor);
    const pinned = await mentor.post(s.url, { body: 'This one is shrinkage, not gas.', markId: s.markId });
    await mentor.post(s.url, { body: 'General remark, not pinned.' });
    const outsider = await signedIn(s.otherStudent);
    const author = await signedIn(s.student);

    // Act
    const forAuthor = await author.get(`/api/workshops/${s.ws}/photos/${s.photoId}/comments`);
    const forOutsider = await outsider.get(`/api/workshops/${s.ws}/photos/${s.photoId}/comments`);
    const missing = await author.get(`/api/workshops/${s.ws}/photos/${s.report.id}/comments`);

    // Assert
    expect(forAuthor.status).toBe(200);
    expect(commentListSchema.parse(forAuthor.body).items.map((c) => [c.id, c.markId])).toEqual([[pinned.body.id, s.markId]]);
    expect(forOutsider.status).toBe(200);
    expect(forOutsider.body.items).toEqual([]);
    expect(missing.status).toBe(404);
  });
});
