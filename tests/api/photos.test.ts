import { QueryTypes } from 'sequelize';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { sequelize } from '../../server/db/sequelize.ts';
import { putObject } from '../../server/lib/object-store.ts';
import { drainObjectDeletions } from '../../server/modules/photos/photos-service.ts';
import { sweepStorage } from '../../server/modules/photos/storage-sweep.ts';
import { insertWorkshopWithCrew } from '../factories/people.ts';
import { insertCasting } from '../factories/photos.ts';
import { ingotPhoto, jpegRotated, jpegWithGps, pngClaiming, svgWithScript } from '../support/images.ts';
import { objectsOf, storageProxy } from '../support/storage.ts';
import { browser, startApp, type Browser, type TestApp } from '../support/test-app.ts';

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

function upload(b: Browser, workshopId: string, castingId: string, files: { name: string; body: Buffer }[]) {
  let req = b.agent.post(`/api/workshops/${workshopId}/castings/${castingId}/photos`).set('x-csrf-token', b.csrfToken);
  for (const f of files) req = req.attach('photos', f.body, { filename: f.name, contentType: 'image/jpeg' });
  return req;
}

async function photoRows(workshopId: string) {
  return sequelize.query<{ id: string }>('SELECT id FROM photos WHERE workshop_id = :workshopId', {
    replacements: { workshopId },
    type: QueryTypes.SELECT,
  });
}

async function setUp() {
  const crew = await insertWorkshopWithCrew();
  const { castingId, heatId } = await insertCasting(crew.workshop.id, crew.caster.id);
  return { ...crew, castingId, heatId, caster: crew.caster, b: await signedIn(crew.caster) };
}

describe('POST /api/workshops/:workshopId/castings/:castingId/photos', () => {
  test('when a JPEG carries GPS EXIF, then 201, a row, three objects, none of them with metadata, and the capture time kept', async () => {
    // Arrange
    const s = await setUp();

    // Act
    const res = await upload(s.b, s.workshop.id, s.castingId, [{ name: 'ingot-7.jpg', body: await jpegWithGps() }]);

    // Assert
    expect(res.status).toBe(201);
    const [result] = res.body.results;
    expect(result.status).toBe('stored');
    expect(result.photo).toMatchObject({ castingId: s.castingId, heatId: s.heatId, fileName: 'ingot-7.jpg', casterId: s.caster.id });
    expect(result.photo.capturedAt).toMatch(/^2026-11-19/);
    expect(await photoRows(s.workshop.id)).toHaveLength(1);
    expect(await objectsOf(s.workshop.id)).toHaveLength(3);
    for (const variant of ['original', 'display', 'thumb']) {
      const img = await s.b.agent.get(result.photo.urls[variant]).buffer(true);
      expect(img.status).toBe(200);
      expect(img.headers['cache-control']).toMatch(/private/);
      const meta = await sharp(img.body).metadata();
      expect(meta.exif, variant).toBeUndefined();
      expect(img.body.includes(Buffer.from('GPS')), variant).toBe(false);
    }
  });

  test('when EXIF says the photo is sideways, then the stored display size is upright', async () => {
    const s = await setUp();

    const res = await upload(s.b, s.workshop.id, s.castingId, [{ name: 'portrait.jpg', body: await jpegRotated(300, 200) }]);

    expect(res.status).toBe(201);
    const photo = res.body.results[0].photo;
    expect(photo.display).toEqual({ width: 200, height: 300 });
    const img = await s.b.agent.get(photo.urls.display).buffer(true);
    const meta = await sharp(img.body).metadata();
    expect([meta.width, meta.height]).toEqual([200, 300]);
  });

  test.each([
    ['a text file named .jpg', 'notes.jpg', () => Promise.resolve(Buffer.from('not a photo at all, just words')), 415],
    ['a truncated JPEG', 'cut.jpg', async () => (await ingotPhoto()).subarray(0, 700), 422],
    ['a 30000 × 30000 PNG', 'bomb.png', () => pngClaiming(30000, 30000), 413],
    ['an SVG with a script', 'drawing.jpg', () => Promise.resolve(svgWithScript()), 415],
  ] as const)('when the upload is %s, then a 4xx names the file and nothing is stored', async (_what, name, make, status) => {
    const s = await setUp();

    // A good photo in the same batch is not stored either.
    const res = await upload(s.b, s.workshop.id, s.castingId, [
      { name: 'good.jpg', body: await ingotPhoto({ seed: 3 }) },
      { name, body: await make() },
    ]);

    expect(res.status).toBe(status);
    expect(res.body.error.message).toContain(name);
    expect(await photoRows(s.workshop.id)).toHaveLength(0);
    expect(await objectsOf(s.workshop.id)).toHaveLength(0);
  });

  test('when the same photo is uploaded twice, then the second is linked to the first and not stored again', async () => {
    const s = await setUp();
    const body = await ingotPhoto({ seed: 11 });

    const first = await upload(s.b, s.workshop.id, s.castingId, [{ name: 'a.jpg', body }]);
    const second = await upload(s.b, s.workshop.id, s.castingId, [{ name: 'copy-of-a.jpg', body }]);

    expect(first.status).toBe(201);
    expect(second.status).toBe(200);
    expect(second.body.results[0].status).toBe('duplicate');
    expect(second.body.results[0].photo.id).toBe(first.body.results[0].photo.id);
    expect(await photoRows(s.workshop.id)).toHaveLength(1);
    expect(await objectsOf(s.workshop.id)).toHaveLength(3);
  });

  test('when the object store goes down after the first object, then 503, no row and no orphan once it is back', async () => {
    const s = await setUp();
    const body = await ingotPhoto({ seed: 21 });
    storageProxy().failAfter(1);

    const res = await upload(s.b, s.workshop.id, s.castingId, [{ name: 'mid-outage.jpg', body }]);

    expect(res.status).toBe(503);
    expect(res.body.error.code).toBe('storage-unavailable');
    expect(res.headers['retry-after']).toBeDefined();
    expect(await photoRows(s.workshop.id)).toHaveLength(0);
    // Back up: the queued clean-up removes what landed before the outage.
    storageProxy().restore();
    await drainObjectDeletions();
    expect(await objectsOf(s.workshop.id)).toEqual([]);
  });

  test('when a student uploads to another member’s casting, then 403 and nothing stored', async () => {
    const s = await setUp();
    const student = await signedIn(s.student);

    const res = await upload(student, s.workshop.id, s.castingId, [{ name: 'x.jpg', body: await ingotPhoto({ seed: 5 }) }]);

    expect(res.status).toBe(403);
    expect(await photoRows(s.workshop.id)).toHaveLength(0);
  });

  test('when a member of another workshop asks for a photo or its image, then 404', async () => {
    const s = await setUp();
    const res = await upload(s.b, s.workshop.id, s.castingId, [{ name: 'a.jpg', body: await ingotPhoto({ seed: 9 }) }]);
    const photo = res.body.results[0].photo;
    const outsider = await signedIn((await insertWorkshopWithCrew()).admin);

    expect((await outsider.get(`/api/workshops/${s.workshop.id}/photos/${photo.id}`)).status).toBe(404);
    expect((await outsider.get(photo.urls.original)).status).toBe(404);
    expect((await outsider.get(`/api/workshops/${s.workshop.id}/photos`)).status).toBe(404);
  });
});

describe('photo deletion and the storage sweep', () => {
  test('when a photo is deleted, then its row goes and its objects leave the store', async () => {
    const s = await setUp();
    const res = await upload(s.b, s.workshop.id, s.castingId, [{ name: 'a.jpg', body: await ingotPhoto({ seed: 31 }) }]);

    const del = await s.b.delete(`/api/workshops/${s.workshop.id}/photos/${res.body.results[0].photo.id}`);
    await drainObjectDeletions();

    expect(del.status).toBe(204);
    expect(await photoRows(s.workshop.id)).toHaveLength(0);
    expect(await objectsOf(s.workshop.id)).toEqual([]);
  });

  test('when an object nobody references is planted, then the sweep finds and removes it and reports a row missing its object', async () => {
    const s = await setUp();
    const res = await upload(s.b, s.workshop.id, s.castingId, [{ name: 'kept.jpg', body: await ingotPhoto({ seed: 41 }) }]);
    const planted = `workshops/${s.workshop.id}/photos/00000000-0000-4000-8000-000000000000/planted-thumb.webp`;
    await putObject(planted, Buffer.from('orphan'), 'image/webp');
    // A row whose thumbnail vanished from the store behind our back.
    const [{ thumb_key: lostKey }] = await sequelize.query<{ thumb_key: string }>('SELECT thumb_key FROM photos WHERE id = :id', {
      replacements: { id: res.body.results[0].photo.id },
      type: QueryTypes.SELECT,
    });
    await (await import('../../server/lib/object-store.ts')).deleteObjects([lostKey]);

    const report = await sweepStorage({ graceMs: 0 });

    expect(report.orphansFound).toContain(planted);
    expect(report.rowsMissingObjects.map((r) => r.key)).toEqual([lostKey]);
    const left = await objectsOf(s.workshop.id);
    expect(left).not.toContain(planted);
    expect(left).toHaveLength(2);
  });
});

describe('marks on a photo', () => {
  test('when a caster marks gas porosity as a point and a cold shut as a box, then both are listed with the photo', async () => {
    const s = await setUp();
    const photo = (await upload(s.b, s.workshop.id, s.castingId, [{ name: 'a.jpg', body: await ingotPhoto({ seed: 51 }) }])).body.results[0].photo;
    const base = `/api/workshops/${s.workshop.id}/photos/${photo.id}/marks`;

    const point = await s.b.post(base, { kind: 'gas_porosity', severity: 3, shape: 'point', x: 0.4, y: 0.5, note: 'cluster under the skin' });
    const box = await s.b.post(base, { kind: 'cold_shut', shape: 'box', x: 0.1, y: 0.2, width: 0.3, height: 0.1 });
    const read = await s.b.get(`/api/workshops/${s.workshop.id}/photos/${photo.id}`);

    expect(point.status).toBe(201);
    expect(box.status).toBe(201);
    expect(box.body.severity).toBe(2);
    expect(read.body.marks.map((m: { kind: string }) => m.kind)).toEqual(['gas_porosity', 'cold_shut']);
  });

  test.each([
    ['an unknown defect kind', { kind: 'bubbles', shape: 'point', x: 0.5, y: 0.5 }, 'kind'],
    ['a point outside the photo', { kind: 'pinholes', shape: 'point', x: 1.2, y: 0.5 }, 'x'],
    ['a box running off the photo', { kind: 'misrun', shape: 'box', x: 0.8, y: 0.1, width: 0.5, height: 0.2 }, 'width'],
    ['a severity of 4', { kind: 'misrun', shape: 'point', x: 0.5, y: 0.5, severity: 4 }, 'severity'],
  ])('when the mark is %s, then 400 names %s', async (_what, body, field) => {
    const s = await setUp();
    const photo = (await upload(s.b, s.workshop.id, s.castingId, [{ name: 'a.jpg', body: await ingotPhoto({ seed: 61 }) }])).body.results[0].photo;

    const res = await s.b.post(`/api/workshops/${s.workshop.id}/photos/${photo.id}/marks`, body);

    expect(res.status).toBe(400);
    expect(res.body.error.issues.map((i: { path: string }) => i.path)).toContain(field);
  });

  test('when a student edits someone else’s mark, then 403; a mentor may', async () => {
    const s = await setUp();
    const photo = (await upload(s.b, s.workshop.id, s.castingId, [{ name: 'a.jpg', body: await ingotPhoto({ seed: 71 }) }])).body.results[0].photo;
    const mark = (await s.b.post(`/api/workshops/${s.workshop.id}/photos/${photo.id}/marks`, { kind: 'pinholes', shape: 'point', x: 0.5, y: 0.5 })).body;
    const url = `/api/workshops/${s.workshop.id}/photos/${photo.id}/marks/${mark.id}`;

    const byStudent = await (await signedIn(s.student)).patch(url, { severity: 1 });
    const byMentor = await (await signedIn(s.mentor)).patch(url, { kind: 'gas_porosity' });

    expect(byStudent.status).toBe(403);
    expect(byMentor.status).toBe(200);
    expect(byMentor.body.kind).toBe('gas_porosity');
  });
});

describe('GET /api/workshops/:workshopId/photos', () => {
  test('when filtered by defect kind and paged, then every matching photo comes once, newest first', async () => {
    const s = await setUp();
    const ids: string[] = [];
    for (let i = 0; i < 5; i++) {
      const photo = (await upload(s.b, s.workshop.id, s.castingId, [{ name: `p${i}.jpg`, body: await ingotPhoto({ seed: 100 + i }) }])).body.results[0].photo;
      if (i % 2 === 0) await s.b.post(`/api/workshops/${s.workshop.id}/photos/${photo.id}/marks`, { kind: 'shrinkage_sink', shape: 'point', x: 0.5, y: 0.5 });
      ids.push(photo.id);
    }

    const seen: string[] = [];
    let cursor: string | null = null;
    do {
      const url = `/api/workshops/${s.workshop.id}/photos?kind=shrinkage_sink&limit=2${cursor ? `&cursor=${cursor}` : ''}`;
      const page = await s.b.get(url);
      expect(page.status).toBe(200);
      seen.push(...page.body.items.map((p: { id: string }) => p.id));
      cursor = page.body.nextCursor;
    } while (cursor);

    expect(seen).toEqual([ids[4], ids[2], ids[0]]);
    const index = await s.b.get(`/api/workshops/${s.workshop.id}/photo-index`);
    expect(index.body.items).toHaveLength(5);
    expect(index.body.items.find((p: { id: string }) => p.id === ids[0]).kinds).toEqual(['shrinkage_sink']);
  });

  test('when the cursor is forged, then 400, not a 500', async () => {
    const s = await setUp();
    const res = await s.b.get(`/api/workshops/${s.workshop.id}/photos?cursor=bm90LWEtY3Vyc29y`);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('cursor-invalid');
  });
});

describe('GET /api/workshops/:workshopId/heats?defect=', () => {
  test('when filtered by a defect kind, then only heats with a casting marked with it are listed', async () => {
    // Arrange: two castings of the same caster; only one gets a gas porosity mark.
    const s = await setUp();
    const other = await insertCasting(s.workshop.id, s.caster.id);
    const photo = (await upload(s.b, s.workshop.id, s.castingId, [{ name: 'a.jpg', body: await ingotPhoto({ seed: 81 }) }])).body.results[0].photo;
    await upload(s.b, s.workshop.id, other.castingId, [{ name: 'b.jpg', body: await ingotPhoto({ seed: 82 }) }]);
    await s.b.post(`/api/workshops/${s.workshop.id}/photos/${photo.id}/marks`, { kind: 'gas_porosity', shape: 'point', x: 0.3, y: 0.3 });

    // Act
    const marked = await s.b.get(`/api/workshops/${s.workshop.id}/heats?defect=gas_porosity`);
    const none = await s.b.get(`/api/workshops/${s.workshop.id}/heats?defect=hot_tear`);
    const bad = await s.b.get(`/api/workshops/${s.workshop.id}/heats?defect=bubbles`);

    // Assert
    expect(marked.status).toBe(200);
    expect(marked.body.items.map((h: { id: string }) => h.id)).toEqual([s.heatId]);
    expect(none.body.items).toEqual([]);
    expect(bad.status).toBe(400);
  });
});
