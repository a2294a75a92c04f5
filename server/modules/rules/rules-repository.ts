import { QueryTypes } from 'sequelize';
import type { Rule } from '../../../shared/domain/index.ts';
import type { DiagnosisInput } from '../../../shared/reports/diagnosis-schemas.ts';
import type { RuleOrigin, StoredWorkshopRule } from '../../../shared/reports/workshop-rule-schemas.ts';
import { sequelize } from '../../db/sequelize.ts';

type Row = {
  ruleId: string;
  origin: RuleOrigin;
  rule: Rule | null;
  enabled: boolean | null;
  weight: number | null;
  updatedAt: Date;
};

/** The workshop's overrides and added rules, added rules in the order they were made. */
export async function listStored(workshopId: string): Promise<StoredWorkshopRule[]> {
  const rows = await sequelize.query<Row>(
    `SELECT rule_id AS "ruleId", origin, rule, enabled, weight, updated_at AS "updatedAt"
       FROM workshop_rules WHERE workshop_id = :workshopId
      ORDER BY created_at, id`,
    { replacements: { workshopId }, type: QueryTypes.SELECT },
  );
  return rows.map((r) => ({ ...r, updatedAt: r.updatedAt.toISOString() }));
}

export async function findStored(workshopId: string, ruleId: string): Promise<StoredWorkshopRule | null> {
  return (await listStored(workshopId)).find((r) => r.ruleId === ruleId) ?? null;
}

/** Creates or changes the override of a shipped rule. */
export async function upsertOverride(
  workshopId: string,
  ruleId: string,
  values: { enabled: boolean | null; weight: number | null },
  userId: string,
): Promise<void> {
  await sequelize.query(
    `INSERT INTO workshop_rules (id, workshop_id, rule_id, origin, rule, enabled, weight, created_by, created_at, updated_at)
     VALUES (gen_random_uuid(), :workshopId, :ruleId, 'default', NULL, :enabled, :weight, :userId, clock_timestamp(), clock_timestamp())
     ON CONFLICT (workshop_id, rule_id) DO UPDATE SET enabled = EXCLUDED.enabled, weight = EXCLUDED.weight, updated_at = clock_timestamp()`,
    { replacements: { workshopId, ruleId, ...values, userId } },
  );
}

/** Adds a rule of the workshop's own; false when its id is taken (by a concurrent add). */
export async function insertRule(workshopId: string, rule: Rule, userId: string): Promise<boolean> {
  const rows = await sequelize.query<{ id: string }>(
    `INSERT INTO workshop_rules (id, workshop_id, rule_id, origin, rule, enabled, weight, created_by, created_at, updated_at)
     VALUES (gen_random_uuid(), :workshopId, :ruleId, 'workshop', CAST(:rule AS jsonb), true, NULL, :userId, clock_timestamp(), clock_timestamp())
     ON CONFLICT (workshop_id, rule_id) DO NOTHING
     RETURNING id`,
    { replacements: { workshopId, ruleId: rule.id, rule: JSON.stringify(rule), userId }, type: QueryTypes.SELECT },
  );
  return rows.length > 0;
}

export async function updateAdded(workshopId: string, ruleId: string, values: { enabled?: boolean; weight?: number | null }): Promise<void> {
  const sets: string[] = [];
  if (values.enabled !== undefined) sets.push('enabled = :enabled');
  if (values.weight !== undefined) sets.push('weight = :weight');
  await sequelize.query(
    `UPDATE workshop_rules SET ${[...sets, 'updated_at = clock_timestamp()'].join(', ')}
      WHERE workshop_id = :workshopId AND rule_id = :ruleId AND origin = 'workshop'`,
    { replacements: { workshopId, ruleId, enabled: values.enabled ?? null, weight: values.weight ?? null } },
  );
}

export async function deleteAdded(workshopId: string, ruleId: string): Promise<void> {
  await sequelize.query(`DELETE FROM workshop_rules WHERE workshop_id = :workshopId AND rule_id = :ruleId AND origin = 'workshop'`, {
    replacements: { workshopId, ruleId },
  });
}

export type ResolvedCase = {
  reportId: string;
  title: string;
  resolvedAt: string | null;
  input: DiagnosisInput;
  confirmed: string[];
};

/** The workshop's newest resolved reports with the input they were diagnosed on and what was confirmed. */
export async function recentResolved(workshopId: string, limit: number): Promise<ResolvedCase[]> {
  const rows = await sequelize.query<{ reportId: string; title: string; resolvedAt: Date | null; input: DiagnosisInput; confirmed: string[] }>(
    `SELECT r.id AS "reportId", r.title, r.resolved_at AS "resolvedAt", r.snapshot -> 'input' AS input,
            COALESCE((SELECT array_agg(c.variable ORDER BY c.created_at, c.variable) FROM report_confirmed_causes c WHERE c.report_id = r.id), '{}') AS confirmed
       FROM reports r
      WHERE r.workshop_id = :workshopId AND r.state = 'resolved' AND r.snapshot IS NOT NULL
      ORDER BY r.resolved_at DESC NULLS LAST, r.id DESC
      LIMIT :limit`,
    { replacements: { workshopId, limit }, type: QueryTypes.SELECT },
  );
  return rows.map((r) => ({ ...r, resolvedAt: r.resolvedAt?.toISOString() ?? null }));
}
