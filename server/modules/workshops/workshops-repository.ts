import { QueryTypes } from 'sequelize';
import type { Role } from '../../../shared/auth/roles.ts';
import type { Member, Workshop } from '../../../shared/workshops/workshop-schemas.ts';
import { sequelize, type Tx } from '../../db/sequelize.ts';
import { MembershipModel, MentorAssignmentModel, WorkshopModel } from './workshop-model.ts';

export async function membershipsOf(userId: string) {
  return sequelize.query<{ workshopId: string; workshopName: string; role: Role }>(
    `SELECT w.id AS "workshopId", w.name AS "workshopName", m.role
       FROM memberships m JOIN workshops w ON w.id = m.workshop_id
      WHERE m.user_id = :userId
      ORDER BY w.name, w.id`,
    { replacements: { userId }, type: QueryTypes.SELECT },
  );
}

export async function workshopsOf(userId: string): Promise<Workshop[]> {
  const rows = await sequelize.query<Omit<Workshop, 'createdAt'> & { createdAt: Date }>(
    `SELECT w.id, w.name, w.kind, m.role, w.created_at AS "createdAt", w.require_mfa_for_staff AS "requireMfaForStaff",
            (SELECT count(*)::int FROM memberships x WHERE x.workshop_id = w.id) AS "memberCount"
       FROM memberships m JOIN workshops w ON w.id = m.workshop_id
      WHERE m.user_id = :userId
      ORDER BY w.name, w.id`,
    { replacements: { userId }, type: QueryTypes.SELECT },
  );
  return rows.map((r) => ({ ...r, createdAt: r.createdAt.toISOString() }));
}

export async function findRole(workshopId: string, userId: string): Promise<Role | null> {
  const m = await MembershipModel.findOne({ where: { workshopId, userId }, attributes: ['role'], raw: true });
  return m?.role ?? null;
}

/**
 * What requireMember needs in one query: the role, whether the workshop
 * requires two-step sign-in of its staff, and whether this user has it on.
 */
export async function findAccess(
  workshopId: string,
  userId: string,
): Promise<{ role: Role; requireMfaForStaff: boolean; mfaEnabled: boolean } | null> {
  const [row] = await sequelize.query<{ role: Role; requireMfaForStaff: boolean; mfaEnabled: boolean }>(
    `SELECT m.role, w.require_mfa_for_staff AS "requireMfaForStaff", (u.totp_enabled_at IS NOT NULL) AS "mfaEnabled"
       FROM memberships m
       JOIN workshops w ON w.id = m.workshop_id
       JOIN users u ON u.id = m.user_id
      WHERE m.workshop_id = :workshopId AND m.user_id = :userId`,
    { replacements: { workshopId, userId }, type: QueryTypes.SELECT },
  );
  return row ?? null;
}

export async function setRequireMfaForStaff(workshopId: string, requireMfaForStaff: boolean): Promise<void> {
  await WorkshopModel.update({ requireMfaForStaff }, { where: { id: workshopId } });
}

export async function createWorkshop(
  values: { name: string; kind: Workshop['kind']; createdBy: string },
  tx: Tx,
): Promise<string> {
  const w = await WorkshopModel.create(values, { transaction: tx });
  return w.id;
}

export async function addMember(workshopId: string, userId: string, role: Role, tx?: Tx): Promise<void> {
  await MembershipModel.create({ workshopId, userId, role }, { transaction: tx });
}

export async function setRole(workshopId: string, userId: string, role: Role, tx?: Tx): Promise<void> {
  await MembershipModel.update({ role }, { where: { workshopId, userId }, transaction: tx });
}

export async function removeMember(workshopId: string, userId: string, tx?: Tx): Promise<void> {
  await MembershipModel.destroy({ where: { workshopId, userId }, transaction: tx });
  await MentorAssignmentModel.destroy({ where: { workshopId, studentId: userId }, transaction: tx });
  await MentorAssignmentModel.destroy({ where: { workshopId, mentorId: userId }, transaction: tx });
}

export async function countAdmins(workshopId: string, tx?: Tx): Promise<number> {
  return MembershipModel.count({ where: { workshopId, role: 'admin' }, transaction: tx });
}

export async function setMentors(workshopId: string, studentId: string, mentorIds: string[], tx: Tx): Promise<void> {
  await MentorAssignmentModel.destroy({ where: { workshopId, studentId }, transaction: tx });
  if (mentorIds.length) {
    await MentorAssignmentModel.bulkCreate(
      mentorIds.map((mentorId) => ({ workshopId, studentId, mentorId })),
      { transaction: tx },
    );
  }
}

export async function listMembers(workshopId: string, tx?: Tx): Promise<Member[]> {
  const rows = await sequelize.query<Omit<Member, 'joinedAt'> & { joinedAt: Date }>(
    `SELECT u.id AS "userId", u.display_name AS "displayName", u.email, m.role, m.created_at AS "joinedAt",
            COALESCE(array_agg(a.mentor_id ORDER BY a.mentor_id) FILTER (WHERE a.mentor_id IS NOT NULL), '{}') AS "mentorIds"
       FROM memberships m
       JOIN users u ON u.id = m.user_id
       LEFT JOIN mentor_assignments a ON a.workshop_id = m.workshop_id AND a.student_id = m.user_id
      WHERE m.workshop_id = :workshopId
      GROUP BY u.id, m.role, m.created_at
      ORDER BY u.display_name, u.id`,
    { replacements: { workshopId }, type: QueryTypes.SELECT, transaction: tx },
  );
  return rows.map((r) => ({ ...r, joinedAt: r.joinedAt.toISOString() }));
}

export async function mentorIdsOf(workshopId: string, studentId: string): Promise<string[]> {
  const rows = await MentorAssignmentModel.findAll({ where: { workshopId, studentId }, attributes: ['mentorId'], raw: true });
  return rows.map((r) => r.mentorId);
}

export async function workshopName(workshopId: string): Promise<string | null> {
  const w = await WorkshopModel.findByPk(workshopId, { attributes: ['name'], raw: true });
  return w?.name ?? null;
}
