import { QueryTypes, type Sequelize } from 'sequelize';
import { hashPassword } from '../server/lib/password.ts';
import { DEMO_PASSWORD, DEMO_PEOPLE, DEMO_WORKSHOP } from './demo-people.ts';

/** The demo workshop's people, roles and mentor assignments (upserts by e-mail and name). */
export async function up({ sequelize }: { sequelize: Sequelize }) {
  const passwordHash = await hashPassword(DEMO_PASSWORD, 12);
  await sequelize.transaction(async (transaction) => {
    const ids = new Map<string, string>();
    for (const p of DEMO_PEOPLE) {
      const [row] = await sequelize.query<{ id: string }>(
        `INSERT INTO users (id, email, password_hash, display_name, created_at, updated_at)
         VALUES (gen_random_uuid(), :email, :passwordHash, :displayName, now(), now())
         ON CONFLICT (email) DO UPDATE SET display_name = EXCLUDED.display_name
         RETURNING id`,
        { replacements: { ...p, passwordHash }, type: QueryTypes.SELECT, transaction },
      );
      ids.set(p.email, row.id);
    }
    const admin = ids.get(DEMO_PEOPLE.find((p) => p.role === 'admin')!.email)!;
    const existing = await sequelize.query<{ id: string }>('SELECT id FROM workshops WHERE name = :name', {
      replacements: DEMO_WORKSHOP,
      type: QueryTypes.SELECT,
      transaction,
    });
    const workshopId =
      existing[0]?.id ??
      (
        await sequelize.query<{ id: string }>(
          `INSERT INTO workshops (id, name, kind, created_by, created_at, updated_at)
           VALUES (gen_random_uuid(), :name, :kind, :admin, now() - interval '4 months', now()) RETURNING id`,
          { replacements: { ...DEMO_WORKSHOP, admin }, type: QueryTypes.SELECT, transaction },
        )
      )[0].id;
    for (const p of DEMO_PEOPLE) {
      await sequelize.query(
        `INSERT INTO memberships (id, workshop_id, user_id, role, created_at, updated_at)
         VALUES (gen_random_uuid(), :workshopId, :userId, :role, now() - interval '4 months', now())
         ON CONFLICT (workshop_id, user_id) DO NOTHING`,
        { replacements: { workshopId, userId: ids.get(p.email), role: p.role }, transaction },
      );
      for (const mentor of p.mentors ?? []) {
        await sequelize.query(
          `INSERT INTO mentor_assignments (id, workshop_id, mentor_id, student_id, created_at, updated_at)
           VALUES (gen_random_uuid(), :workshopId, :mentorId, :studentId, now(), now())
           ON CONFLICT (workshop_id, mentor_id, student_id) DO NOTHING`,
          { replacements: { workshopId, mentorId: ids.get(mentor), studentId: ids.get(p.email) }, transaction },
        );
      }
    }
  });
}
