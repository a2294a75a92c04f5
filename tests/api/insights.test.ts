import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import type { Role } from '../../shared/auth/roles.ts';
import { findDefectKind, median, pourYield, type DefectKindId } from '../../shared/domain/index.ts';
import { sequelize } from '../../server/db/sequelize.ts';
import { insertCrucible, insertFurnace, insertHeat } from '../factories/heats.ts';
import { insertPhotoWithMarks } from '../factories/marks.ts';
import { assignMentor, insertMember, insertWorkshopWithCrew, type InsertedUser } from '../factories/people.ts';
import { browser, startApp, type TestApp } from '../support/test-app.ts';

// Every expected figure below is counted here, from the same spec the rows
// were written from, with plain loops: never by calling the insights service
// or its aggregation. Yield goes through the trade core's pourYield and
// median, the definitions the insight promises to use (Giesserei-Lexikon,
// "Output", as cited in shared/domain/melt.ts).

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

type Who = 'mentee' | 'student' | 'caster' | 'mentor' | 'admin';
type CastingSpec = { massG: number | null; preheatC: number | null; photos: DefectKindId[][] };
type HeatSpec = {
  who: Who;
  pouredAt: string;
  alloy: string;
  pourTempC: number | null;
  setpointC: number | null;
  furnace: 'f1' | 'f2' | null;
  crucible: 'k1' | 'k2' | null;
  chargeG: number;
  castings: CastingSpec[];
};

// A class over three months. The mentee is the mentor's student; "student"
// is nobody's mentee.
const SPEC: HeatSpec[] = [
  {
    who: 'mentee', pouredAt: '2026-09-05T10:00:00.000Z', alloy: 'A356.0', pourTempC: 705, setpointC: 730, furnace: 'f1', crucible: 'k1', chargeG: 1000,
    castings: [
      { massG: 600, preheatC: 220, photos: [['gas_porosity', 'gas_porosity'], ['cold_shut']] },
      { massG: 200, preheatC: 310, photos: [] },
    ],
  },
  {
    who: 'mentee', pouredAt: '2026-09-20T10:00:00.000Z', alloy: 'A356.0', pourTempC: 728, setpointC: 740, furnace: 'f1', crucible: 'k1', chargeG: 1200,
    castings: [{ massG: 700, preheatC: 180, photos: [['shrinkage_porosity']] }],
  },
  {
    who: 'student', pouredAt: '2026-10-02T10:00:00.000Z', alloy: 'A356.0', pourTempC: 745, setpointC: 760, furnace: 'f2', crucible: 'k1', chargeG: 900,
    castings: [
      { massG: 500, preheatC: null, photos: [['gas_porosity', 'pinholes']] },
      { massG: null, preheatC: 240, photos: [] },
    ],
  },
  {
    who: 'caster', pouredAt: '2026-10-15T10:00:00.000Z', alloy: 'A356.0', pourTempC: 719, setpointC: 735, furnace: 'f1', crucible: 'k2', chargeG: 1500,
    castings: [{ massG: 900, preheatC: 260, photos: [['misrun'], ['misrun', 'oxide_inclusions']] }],
  },
  {
    who: 'mentor', pouredAt: '2026-10-28T10:00:00.000Z', alloy: 'A356.0', pourTempC: 700, setpointC: 720, furnace: 'f2', crucible: null, chargeG: 800,
    castings: [{ massG: 450, preheatC: 200, photos: [] }],
  },
  {
    who: 'mentee', pouredAt: '2026-11-03T10:00:00.000Z', alloy: 'A356.0', pourTempC: 761, setpointC: 750, furnace: 'f2', crucible: 'k2', chargeG: 1000,
    castings: [
      { massG: 550, preheatC: 330, photos: [['gas_porosity']] },
      { massG: 300, preheatC: 345, photos: [['hot_tear']] },
    ],
  },
  {
    who: 'admin', pouredAt: '2026-11-10T10:00:00.000Z', alloy: '319.0', pourTempC: 740, setpointC: 755, furnace: 'f1', crucible: 'k1', chargeG: 1100,
    castings: [{ massG: 600, preheatC: 150, photos: [['hot_tear']] }],
  },
  {
    who: 'student', pouredAt: '2026-11-25T10:00:00.000Z', alloy: 'A356.0', pourTempC: 712, setpointC: null, furnace: 'f1', crucible: 'k2', chargeG: 700,
    castings: [],
  },
  {
    who: 'mentee', pouredAt: '2026-11-28T10:00:00.000Z', alloy: 'A356.0', pourTempC: null, setpointC: 740, furnace: 'f1', crucible: 'k1', chargeG: 1000,
    castings: [{ massG: 400, preheatC: null, photos: [['gas_porosity']] }],
  },
];

/** Whose heats each role reads: its own, a mentor also the mentee's, an admin everyone's. */
const READS: Record<Who, Who[]> = {
  mentee: ['mentee'],
  student: ['student'],
  caster: ['caster'],
  mentor: ['mentor', 'mentee'],
  admin: ['mentee', 'student', 'caster', 'mentor', 'admin'],
};

type Seeded = {
  workshopId: string;
  people: Record<Who, InsertedUser>;
  heats: { spec: HeatSpec; id: string; castingIds: string[] }[];
  furnaces: Record<'f1' | 'f2', string>;
  crucibles: Record<'k1' | 'k2', string>;
};

let seeded: Promise<Seeded> | undefined;

async function seed(): Promise<Seeded> {
  const crew = await insertWorkshopWithCrew();
  const workshopId = crew.workshop.id;
  const other = await insertMember(workshopId, 'student');
  await assignMentor(workshopId, crew.mentor.id, crew.student.id);
  const people: Record<Who, InsertedUser> = { mentee: crew.student, student: other, caster: crew.caster, mentor: crew.mentor, admin: crew.admin };
  const [f1, f2, k1, k2] = await Promise.all([
    insertFurnace(workshopId, { name: 'Electric kiln' }),
    insertFurnace(workshopId, { name: 'Propane furnace', kind: 'gas' }),
    insertCrucible(workshopId, { name: 'A6 clay-graphite' }),
    insertCrucible(workshopId, { name: 'A10 silicon carbide', material: 'silicon_carbide' }),
  ]);
  const furnaces = { f1: f1.id, f2: f2.id };
  const crucibles = { k1: k1.id, k2: k2.id };
  const heats: Seeded['heats'] = [];
  for (const spec of SPEC) {
    const heat = await insertHeat({
      workshopId,
      casterId: people[spec.who].id,
      pouredAt: spec.pouredAt,
      alloy: spec.alloy,
      pourTempC: spec.pourTempC,
      peakTempC: null,
      setpointC: spec.setpointC,
      furnaceId: spec.furnace ? furnaces[spec.furnace] : null,
      crucibleId: spec.crucible ? crucibles[spec.crucible] : null,
      chargeLines: [{ kind: 'ingot', massG: spec.chargeG }],
      castings: spec.castings.map((c) => ({ massG: c.massG, mouldPreheatC: c.preheatC })),
    });
    const rows = await sequelize.query<{ id: string }>('SELECT id FROM castings WHERE heat_id = :heatId ORDER BY position', {
      replacements: { heatId: heat.id },
      type: QueryTypes.SELECT,
    });
    const castingIds = rows.map((r) => r.id);
    for (const [i, casting] of spec.castings.entries()) {
      for (const kinds of casting.photos) await insertPhotoWithMarks(workshopId, castingIds[i], people[spec.who].id, kinds);
    }
    heats.push({ spec, id: heat.id, castingIds });
  }
  return { workshopId, people, heats, furnaces, crucibles };
}

const seededWorkshop = () => (seeded ??= seed());
const visible = (s: Seeded, who: Who) => s.heats.filter((h) => READS[who].includes(h.spec.who));
const month = (iso: string) => iso.slice(0, 7);

async function ask(who: Who, name: string, query = '') {
  const s = await seededWorkshop();
  const b = await signedIn(s.people[who]);
  return b.get(`/api/workshops/${s.workshopId}/insights/${name}${query ? `?${query}` : ''}`);
}

// ── expectations, counted from the spec ─────────────────────────────────────

function expectedFrequency(heats: Seeded['heats']) {
  const months = new Map<string, { castings: number; kinds: Map<string, { castings: number; marks: number }> }>();
  for (const h of heats) {
    for (const c of h.spec.castings) {
      const m = months.get(month(h.spec.pouredAt)) ?? { castings: 0, kinds: new Map() };
      m.castings += 1;
      const marksByKind = new Map<string, number>();
      for (const photo of c.photos) for (const kind of photo) marksByKind.set(kind, (marksByKind.get(kind) ?? 0) + 1);
      for (const [kind, marks] of marksByKind) {
        const k = m.kinds.get(kind) ?? { castings: 0, marks: 0 };
        k.castings += 1;
        k.marks += marks;
        m.kinds.set(kind, k);
      }
      months.set(month(h.spec.pouredAt), m);
    }
  }
  return months;
}

function expectedBands(heats: Seeded['heats'], value: (h: HeatSpec, c: CastingSpec) => number | null, width: number) {
  const bands = new Map<number, { heats: Set<string>; castings: number; groups: Map<string, number> }>();
  let unrecorded = 0;
  for (const h of heats) {
    for (const c of h.spec.castings) {
      const v = value(h.spec, c);
      if (v === null) {
        unrecorded += 1;
        continue;
      }
      const from = Math.floor(v / width) * width;
      const band = bands.get(from) ?? { heats: new Set(), castings: 0, groups: new Map() };
      band.heats.add(h.id);
      band.castings += 1;
      const groups = new Set(c.photos.flat().map((kind) => findDefectKind(kind)!.group));
      for (const g of groups) band.groups.set(g, (band.groups.get(g) ?? 0) + 1);
      bands.set(from, band);
    }
  }
  return { bands, unrecorded };
}

// ── tests ───────────────────────────────────────────────────────────────────

describe('GET /api/workshops/:workshopId/insights/defect-frequency', () => {
  test.each<Who>(['admin', 'mentor', 'mentee', 'student', 'caster'])(
    'when %s asks, then castings and marks per kind per month equal the counts of the heats they may read',
    async (who) => {
      // Arrange
      const s = await seededWorkshop();
      const expected = expectedFrequency(visible(s, who));

      // Act
      const res = await ask(who, 'defect-frequency');

      // Assert
      expect(res.status).toBe(200);
      const months = res.body.months as { month: string; castings: number; kinds: { kind: string; castings: number; marks: number }[] }[];
      const withData = months.filter((m) => m.castings > 0);
      expect(withData.map((m) => m.month)).toEqual([...expected.keys()].sort());
      for (const m of withData) {
        const e = expected.get(m.month)!;
        expect(m.castings).toBe(e.castings);
        expect(Object.fromEntries(m.kinds.map((k) => [k.kind, { castings: k.castings, marks: k.marks }]))).toEqual(Object.fromEntries(e.kinds));
      }
      // Months run without gaps from the first to the last.
      for (let i = 1; i < months.length; i++) {
        const [y, mo] = months[i - 1].month.split('-').map(Number);
        expect(months[i].month).toBe(mo === 12 ? `${y + 1}-01` : `${y}-${String(mo + 1).padStart(2, '0')}`);
      }
    },
  );

  test('when the mentor narrows to the mentee and to October–November, then only those heats count', async () => {
    // Arrange
    const s = await seededWorkshop();
    const heats = visible(s, 'mentor').filter((h) => h.spec.who === 'mentee' && h.spec.pouredAt >= '2026-10-01' && h.spec.pouredAt < '2026-12-01');
    const expected = expectedFrequency(heats);

    // Act
    const res = await ask('mentor', 'defect-frequency', `casterId=${s.people.mentee.id}&from=2026-10-01&to=2026-11-30`);

    // Assert
    expect(res.status).toBe(200);
    expect(res.body.months.map((m: { month: string }) => m.month)).toEqual(['2026-11']);
    expect(res.body.months[0].castings).toBe(expected.get('2026-11')!.castings);
    expect(res.body.kinds.sort()).toEqual([...expected.get('2026-11')!.kinds.keys()].sort());
  });

  test('when a student names someone else as the caster, then nothing of theirs is counted', async () => {
    // Arrange
    const s = await seededWorkshop();

    // Act
    const res = await ask('student', 'defect-frequency', `casterId=${s.people.mentee.id}`);

    // Assert
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ months: [], kinds: [] });
  });
});

describe('GET /api/workshops/:workshopId/insights/defect-rate-by-pour-band', () => {
  test('when the admin asks for A356.0, then each 20 °C band’s castings and group shares equal the counts', async () => {
    // Arrange
    const s = await seededWorkshop();
    const heats = visible(s, 'admin').filter((h) => h.spec.alloy === 'A356.0');
    const { bands, unrecorded } = expectedBands(heats, (h) => h.pourTempC, 20);

    // Act
    const res = await ask('admin', 'defect-rate-by-pour-band', 'alloy=A356.0');

    // Assert
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ alloy: 'A356.0', bandWidthC: 20, by: 'group', unrecorded: { castings: unrecorded } });
    expect(res.body.bands.map((b: { fromC: number }) => b.fromC)).toEqual([...bands.keys()].sort((a, b) => a - b));
    for (const band of res.body.bands as { fromC: number; toC: number; heats: number; castings: number; rates: { key: string; castings: number; share: number }[] }[]) {
      const e = bands.get(band.fromC)!;
      expect(band.toC).toBe(band.fromC + 20);
      expect(band.castings).toBe(e.castings);
      expect(band.heats).toBe(e.heats.size);
      for (const rate of band.rates) {
        expect(rate.castings).toBe(e.groups.get(rate.key) ?? 0);
        expect(rate.share).toBeCloseTo((e.groups.get(rate.key) ?? 0) / e.castings, 10);
      }
    }
  });

  test('when a kind is chosen, then the one rate is the share of castings with that kind', async () => {
    // Arrange
    const s = await seededWorkshop();
    const heats = visible(s, 'mentor').filter((h) => h.spec.alloy === 'A356.0');
    const byBand = new Map<number, { castings: number; hit: number }>();
    for (const h of heats) {
      for (const c of h.spec.castings) {
        if (h.spec.pourTempC === null) continue;
        const from = Math.floor(h.spec.pourTempC / 20) * 20;
        const e = byBand.get(from) ?? { castings: 0, hit: 0 };
        e.castings += 1;
        if (c.photos.flat().includes('gas_porosity')) e.hit += 1;
        byBand.set(from, e);
      }
    }

    // Act
    const res = await ask('mentor', 'defect-rate-by-pour-band', 'alloy=A356.0&kind=gas_porosity');

    // Assert
    expect(res.status).toBe(200);
    expect(res.body.by).toBe('kind');
    expect(res.body.keys).toEqual(['gas_porosity']);
    const got = Object.fromEntries(
      (res.body.bands as { fromC: number; castings: number; rates: { castings: number }[] }[]).map((b) => [b.fromC, { castings: b.castings, hit: b.rates[0].castings }]),
    );
    expect(got).toEqual(Object.fromEntries(byBand));
  });

  test('when no alloy is given, then 400 names the alloy', async () => {
    const res = await ask('admin', 'defect-rate-by-pour-band');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation-failed');
    expect(res.body.error.issues.map((i: { path: string }) => i.path)).toContain('alloy');
  });
});

describe('GET /api/workshops/:workshopId/insights/defect-rate-by-mould-preheat-band', () => {
  test.each<Who>(['admin', 'mentee'])('when %s asks, then 50 °C preheat bands equal the counts', async (who) => {
    // Arrange
    const s = await seededWorkshop();
    const { bands, unrecorded } = expectedBands(visible(s, who), (_h, c) => c.preheatC, 50);

    // Act
    const res = await ask(who, 'defect-rate-by-mould-preheat-band');

    // Assert
    expect(res.status).toBe(200);
    expect(res.body.unrecorded.castings).toBe(unrecorded);
    expect(
      Object.fromEntries((res.body.bands as { fromC: number; castings: number; heats: number }[]).map((b) => [b.fromC, [b.castings, b.heats]])),
    ).toEqual(Object.fromEntries([...bands].map(([from, b]) => [from, [b.castings, b.heats.size]])));
  });
});

describe('GET /api/workshops/:workshopId/insights/yield-trend', () => {
  test.each<Who>(['admin', 'mentor', 'student'])('when %s asks, then each month’s median and mean yield are those of the fully weighed heats', async (who) => {
    // Arrange
    const s = await seededWorkshop();
    const byMonth = new Map<string, number[]>();
    let excluded = 0;
    for (const h of visible(s, who)) {
      const weighed = h.spec.castings.length > 0 && h.spec.castings.every((c) => c.massG !== null);
      if (!weighed) {
        excluded += 1;
        continue;
      }
      const castingG = h.spec.castings.reduce((sum, c) => sum + c.massG!, 0);
      const list = byMonth.get(month(h.spec.pouredAt)) ?? [];
      list.push(pourYield({ chargeG: h.spec.chargeG, castingG }).yieldPct);
      byMonth.set(month(h.spec.pouredAt), list);
    }

    // Act
    const res = await ask(who, 'yield-trend');

    // Assert
    expect(res.status).toBe(200);
    expect(res.body.excluded).toBe(excluded);
    const withHeats = (res.body.months as { month: string; heats: number; medianPct: number; meanPct: number }[]).filter((m) => m.heats > 0);
    expect(withHeats.map((m) => m.month)).toEqual([...byMonth.keys()].sort());
    for (const m of withHeats) {
      const yields = byMonth.get(m.month)!;
      expect(m.heats).toBe(yields.length);
      expect(m.medianPct).toBeCloseTo(median(yields), 10);
      expect(m.meanPct).toBeCloseTo(yields.reduce((a, b) => a + b, 0) / yields.length, 10);
    }
  });
});

describe('GET /api/workshops/:workshopId/insights/crucible-cycles', () => {
  test('when the mentee asks, then they see only their heats, each at the crucible’s true cycle number', async () => {
    // Arrange
    const s = await seededWorkshop();
    const cycleOf = new Map<string, number>();
    for (const key of ['k1', 'k2'] as const) {
      const onIt = s.heats.filter((h) => h.spec.crucible === key).sort((a, b) => a.spec.pouredAt.localeCompare(b.spec.pouredAt));
      onIt.forEach((h, i) => cycleOf.set(h.id, i + 1));
    }

    // Act
    const res = await ask('mentee', 'crucible-cycles');

    // Assert
    expect(res.status).toBe(200);
    for (const key of ['k1', 'k2'] as const) {
      const crucible = (res.body.crucibles as { id: string; cycleCount: number; points: { heatId: string; cycle: number }[] }[]).find(
        (c) => c.id === s.crucibles[key],
      )!;
      expect(crucible.cycleCount).toBe(s.heats.filter((h) => h.spec.crucible === key).length);
      const mine = visible(s, 'mentee').filter((h) => h.spec.crucible === key);
      expect(crucible.points.map((p) => [p.heatId, p.cycle])).toEqual(mine.map((h) => [h.id, cycleOf.get(h.id)]));
    }
  });

  test('when a crucible has a condition note and is retired, then both are in its line', async () => {
    // Arrange
    const s = await seededWorkshop();
    const admin = await signedIn(s.people.admin);
    await admin.post(`/api/workshops/${s.workshopId}/crucibles/${s.crucibles.k2}/notes`, { note: 'Hairline crack at the rim', notedOn: '2026-11-20' });
    await admin.patch(`/api/workshops/${s.workshopId}/crucibles/${s.crucibles.k2}`, { retired: true, retiredOn: '2026-11-30' });

    // Act
    const res = await ask('caster', 'crucible-cycles');

    // Assert
    const k2 = (res.body.crucibles as { id: string; retiredOn: string | null; notes: { notedOn: string; note: string }[] }[]).find(
      (c) => c.id === s.crucibles.k2,
    )!;
    expect(k2.notes).toEqual([expect.objectContaining({ notedOn: '2026-11-20', note: 'Hairline crack at the rim' })]);
    expect(k2.retiredOn).not.toBeNull();
  });
});

describe('GET /api/workshops/:workshopId/insights/furnace-offset', () => {
  test.each<Who>(['admin', 'mentor'])('when %s asks, then every readable heat with both readings is a point at pour − setpoint', async (who) => {
    // Arrange
    const s = await seededWorkshop();

    // Act
    const res = await ask(who, 'furnace-offset');

    // Assert
    expect(res.status).toBe(200);
    for (const key of ['f1', 'f2'] as const) {
      const heats = visible(s, who).filter((h) => h.spec.furnace === key && h.spec.pourTempC !== null && h.spec.setpointC !== null);
      const furnace = (res.body.furnaces as { id: string; medianOffsetC: number; points: { heatId: string; offsetC: number }[] }[]).find(
        (f) => f.id === s.furnaces[key],
      );
      const offsets = heats.map((h) => h.spec.pourTempC! - h.spec.setpointC!);
      expect(furnace?.points.map((p) => [p.heatId, p.offsetC]) ?? []).toEqual(heats.map((h, i) => [h.id, offsets[i]]));
      if (offsets.length) expect(furnace!.medianOffsetC).toBe(median(offsets));
    }
  });
});

describe('insights across workshops and bad input', () => {
  test.each<Role>(['admin', 'student'])('when a %s of another workshop asks, then 404 as for a missing workshop', async (role) => {
    // Arrange
    const s = await seededWorkshop();
    const elsewhere = await insertWorkshopWithCrew();
    const outsider = role === 'admin' ? elsewhere.admin : elsewhere.student;
    const b = await signedIn(outsider);

    // Act
    const res = await b.get(`/api/workshops/${s.workshopId}/insights/defect-frequency`);

    // Assert
    expect(res.status).toBe(404);
  });

  test('when the dates are the wrong way round or a kind is unknown, then 400 names the field', async () => {
    const backwards = await ask('admin', 'yield-trend', 'from=2026-11-30&to=2026-10-01');
    const unknownKind = await ask('admin', 'defect-rate-by-mould-preheat-band', 'kind=bubbles');
    expect(backwards.status).toBe(400);
    expect(backwards.body.error.issues.map((i: { path: string }) => i.path)).toContain('to');
    expect(unknownKind.status).toBe(400);
    expect(unknownKind.body.error.issues.map((i: { path: string }) => i.path)).toContain('kind');
  });

  test('when someone is not signed in, then 401', async () => {
    const s = await seededWorkshop();
    const b = await browser(t.app);
    const res = await b.get(`/api/workshops/${s.workshopId}/insights/furnace-offset`);
    expect(res.status).toBe(401);
  });
});
