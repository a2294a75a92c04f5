import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { DEFAULT_RULES } from '../../shared/domain/index.ts';
import type { Rule } from '../../shared/domain/index.ts';
import { diagnosisSchema } from '../../shared/reports/diagnosis-schemas.ts';
import { rulePreviewSchema, workshopRuleSchema, workshopRulesSchema } from '../../shared/reports/workshop-rule-schemas.ts';
import { effectiveRuleSet } from '../../server/modules/rules/rules-service.ts';
import { assignMentor, insertWorkshopWithCrew } from '../factories/people.ts';
import { insertReport } from '../factories/reports.ts';
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

/** A workshop rule: a crucible kept in a damp shed implicates its condition for gas porosity. */
function buildRule(overrides: Partial<Rule> = {}): Rule {
  return {
    id: `damp-crucible-gas-${Math.random().toString(36).slice(2, 8)}`,
    defects: ['gas_porosity'],
    when: { field: 'crucibleCycles', op: 'gte', value: 0 },
    variable: 'crucible_condition',
    weight: 0.95,
    evidence: 'this crucible is stored in the damp shed ({crucibleCycles} heats)',
    fixes: ['Bake the crucible at 200 °C before the first melt of the day.'],
    source: 'workshop experience, Thursday class',
    ...overrides,
  };
}

describe('GET /api/workshops/:workshopId/rules', () => {
  test('when a student reads the rules, then every shipped rule is listed, switched on, with the set’s stamp', async () => {
    const s = await setUp();
    const b = await signedIn(s.student);

    const res = await b.get(`/api/workshops/${s.ws}/rules`);

    expect(res.status).toBe(200);
    const body = workshopRulesSchema.parse(res.body);
    expect(body.rules.map((r) => r.rule.id)).toEqual(DEFAULT_RULES.map((r) => r.id));
    expect(body.rules.every((r) => r.enabled && r.origin === 'default' && !r.overridden)).toBe(true);
    expect(body.ruleSet.custom).toBe(false);
  });
});

describe('PATCH /api/workshops/:workshopId/rules/:ruleId', () => {
  test('when a mentor switches a rule off and reweights another, then the listing and the diagnosis follow, and a reset restores the weight', async () => {
    // Arrange
    const s = await setUp();
    const b = await signedIn(s.mentor);
    const base = `/api/workshops/${s.ws}/rules`;
    const whatIf = { alloy: 'A356.0', defects: [{ kind: 'gas_porosity', severity: 3 }], conditions: { degassed: false, chargeKind: 'dirty_scrap' } };
    const before = diagnosisSchema.parse((await b.post(`/api/workshops/${s.ws}/diagnosis`, whatIf)).body);

    // Act
    const off = await b.patch(`${base}/undegassed-gas`, { enabled: false });
    const heavier = await b.patch(`${base}/dirty-charge-gas`, { weight: 0.2 });
    const after = diagnosisSchema.parse((await b.post(`/api/workshops/${s.ws}/diagnosis`, whatIf)).body);
    const reset = await b.patch(`${base}/dirty-charge-gas`, { weight: null });

    // Assert
    expect(off.status).toBe(200);
    expect(workshopRuleSchema.parse(off.body)).toMatchObject({ enabled: false, overridden: true, origin: 'default' });
    expect(heavier.body).toMatchObject({ rule: { weight: 0.2 }, defaultWeight: 0.65, overridden: true });
    expect(before.causes.find((c) => c.variable === 'degassing')?.status).toBe('confirmed');
    expect(after.causes.find((c) => c.variable === 'degassing')).toBeUndefined();
    expect(after.ruleSet).toMatchObject({ custom: true });
    expect(after.ruleSet.hash).not.toBe(before.ruleSet.hash);
    expect(reset.body).toMatchObject({ rule: { weight: 0.65 }, overridden: false });
  });

  test.each([
    ['student', 403],
    ['caster', 403],
    ['admin', 200],
  ] as const)('when a %s changes a rule, then %i', async (role, status) => {
    const s = await setUp();
    const b = await signedIn(s[role]);

    const res = await b.patch(`/api/workshops/${s.ws}/rules/hot-pour-gas`, { enabled: false });

    expect(res.status).toBe(status);
  });

  test.each([
    ['an unknown rule', 'no-such-rule', { enabled: false }, 404],
    ['a weight above 1', 'hot-pour-gas', { weight: 1.5 }, 400],
    ['nothing to change', 'hot-pour-gas', {}, 400],
    ['a malformed id', 'Hot_Pour', { enabled: false }, 400],
  ])('when the change names %s, then %i', async (_what, ruleId, body, status) => {
    const s = await setUp();
    const b = await signedIn(s.mentor);

    const res = await b.patch(`/api/workshops/${s.ws}/rules/${ruleId}`, body);

    expect(res.status).toBe(status);
  });
});

describe('POST and DELETE /api/workshops/:workshopId/rules', () => {
  test('when a mentor adds a valid rule, then it is listed after the shipped ones, ranks causes and can be deleted again', async () => {
    // Arrange
    const s = await setUp();
    const b = await signedIn(s.mentor);
    const rule = buildRule();

    // Act
    const created = await b.post(`/api/workshops/${s.ws}/rules`, rule);
    const listed = workshopRulesSchema.parse((await b.get(`/api/workshops/${s.ws}/rules`)).body);
    const ranked = diagnosisSchema.parse(
      (await b.post(`/api/workshops/${s.ws}/diagnosis`, { defects: [{ kind: 'gas_porosity', severity: 3 }], conditions: { crucibleCycles: 3 } })).body,
    );
    const deleted = await b.delete(`/api/workshops/${s.ws}/rules/${rule.id}`);
    const again = workshopRulesSchema.parse((await b.get(`/api/workshops/${s.ws}/rules`)).body);

    // Assert
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ origin: 'workshop', enabled: true, defaultWeight: null, rule });
    expect(listed.rules.at(-1)?.rule.id).toBe(rule.id);
    expect(ranked.causes[0]).toMatchObject({ variable: 'crucible_condition', status: 'confirmed' });
    expect(ranked.causes[0].evidence[0]).toContain('damp shed (3 heats)');
    expect(deleted.status).toBe(204);
    expect(again.rules.map((r) => r.rule.id)).not.toContain(rule.id);
  });

  test.each([
    ['an id of a shipped rule', { id: 'hot-pour-gas' }, 409, null],
    ['a weight above 1', { weight: 2 }, 400, 'weight'],
    ['an unknown defect', { defects: ['bubbles'] }, 400, 'defects.0'],
    ['an unknown placeholder', { evidence: 'it was {colour}' }, 400, 'evidence'],
    ['no fixes', { fixes: [] }, 400, 'fixes'],
  ] as const)('when the new rule has %s, then %i', async (_what, overrides, status, path) => {
    const s = await setUp();
    const b = await signedIn(s.mentor);

    const res = await b.post(`/api/workshops/${s.ws}/rules`, buildRule(overrides as Partial<Rule>));

    expect(res.status).toBe(status);
    if (path) expect(res.body.error.issues.map((i: { path: string }) => i.path)).toContain(path);
  });

  test('when the same id is added twice, then the second answers 409 rule-id-taken', async () => {
    const s = await setUp();
    const b = await signedIn(s.admin);
    const rule = buildRule();

    await b.post(`/api/workshops/${s.ws}/rules`, rule);
    const res = await b.post(`/api/workshops/${s.ws}/rules`, rule);

    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('rule-id-taken');
  });

  test.each([
    ['a shipped rule', 'hot-pour-gas', 'mentor', 409],
    ['an unknown rule', 'never-added', 'mentor', 404],
    ['any rule, as a student', 'hot-pour-gas', 'student', 403],
  ] as const)('when deleting %s, then %i', async (_what, ruleId, role, status) => {
    const s = await setUp();
    const b = await signedIn(s[role]);

    const res = await b.delete(`/api/workshops/${s.ws}/rules/${ruleId}`);

    expect(res.status).toBe(status);
  });

  test('when another workshop adds a rule, then this workshop’s rule set is untouched', async () => {
    const s = await setUp();
    const other = await setUp();
    const b = await signedIn(other.mentor);

    await b.post(`/api/workshops/${other.ws}/rules`, buildRule());
    const mine = await signedIn(s.mentor);
    const res = workshopRulesSchema.parse((await mine.get(`/api/workshops/${s.ws}/rules`)).body);

    expect(res.rules).toHaveLength(DEFAULT_RULES.length);
    expect(res.ruleSet.custom).toBe(false);
  });
});

describe('the effective rule set', () => {
  test('when nothing changes, then the same frozen array is reused; a change gives a new one', async () => {
    // Arrange
    const s = await setUp();
    const b = await signedIn(s.mentor);
    await b.patch(`/api/workshops/${s.ws}/rules/hot-pour-gas`, { weight: 0.5 });

    // Act
    const first = await effectiveRuleSet(s.ws);
    const second = await effectiveRuleSet(s.ws);
    await b.patch(`/api/workshops/${s.ws}/rules/hot-pour-gas`, { weight: 0.4 });
    const third = await effectiveRuleSet(s.ws);

    // Assert
    expect(second.rules).toBe(first.rules);
    expect(Object.isFrozen(first.rules)).toBe(true);
    expect(third.rules).not.toBe(first.rules);
    expect(third.rules.find((r) => r.id === 'hot-pour-gas')?.weight).toBe(0.4);
  });
});

describe('POST /api/workshops/:workshopId/rules/preview', () => {
  test('when a candidate rule favours the cause reviewers confirmed, then the last resolved reports rank it higher after than before', async () => {
    // Arrange: reviewers confirmed crucible condition twice; the shipped rules rank it low.
    const s = await setUp();
    for (let i = 0; i < 2; i++) {
      await insertReport({ workshopId: s.ws, authorId: s.student.id, state: 'resolved', confirmed: ['crucible_condition'], reviewerId: s.mentor.id });
    }
    const b = await signedIn(s.mentor);
    const rule = buildRule({ when: { field: 'pourTempC', op: 'gte', value: 0 } });

    // Act
    const res = await b.post(`/api/workshops/${s.ws}/rules/preview`, { rule });

    // Assert
    expect(res.status).toBe(200);
    const preview = rulePreviewSchema.parse(res.body);
    expect(preview.reports).toHaveLength(2);
    for (const r of preview.reports) {
      expect(r.confirmedCauses).toEqual(['crucible_condition']);
      expect(r.before[0].variable).not.toBe('crucible_condition');
      expect(r.after[0].variable).toBe('crucible_condition');
      expect(r.bestConfirmedRankAfter).toBe(1);
      expect(r.bestConfirmedRankBefore! > 1).toBe(true);
    }
    expect(preview.summary).toEqual({ improved: 2, worsened: 0, unchanged: 0 });
    // A preview changes nothing.
    expect(workshopRulesSchema.parse((await b.get(`/api/workshops/${s.ws}/rules`)).body).ruleSet.custom).toBe(false);
  });

  test('when an override switches off the rule behind the confirmed cause, then the preview shows it falling', async () => {
    const s = await setUp();
    await insertReport({ workshopId: s.ws, authorId: s.student.id, state: 'resolved', confirmed: ['degassing'], heat: { degassing: 'none' } });
    const b = await signedIn(s.admin);

    const res = await b.post(`/api/workshops/${s.ws}/rules/preview`, { override: { ruleId: 'undegassed-gas', enabled: false } });

    const preview = rulePreviewSchema.parse(res.body);
    expect(preview.reports[0].bestConfirmedRankBefore).toBe(1);
    expect(preview.reports[0].bestConfirmedRankAfter === null || preview.reports[0].bestConfirmedRankAfter > 1).toBe(true);
    expect(preview.summary.worsened).toBe(1);
  });

  test.each([
    ['a student', 'student', { override: { ruleId: 'hot-pour-gas', enabled: false } }, 403],
    ['an unknown rule', 'mentor', { override: { ruleId: 'nope', enabled: false } }, 404],
    ['an empty body', 'mentor', {}, 400],
  ] as const)('when %s asks for a preview, then %i', async (_what, role, body, status) => {
    const s = await setUp();
    const b = await signedIn(s[role]);

    const res = await b.post(`/api/workshops/${s.ws}/rules/preview`, body);

    expect(res.status).toBe(status);
  });
});
