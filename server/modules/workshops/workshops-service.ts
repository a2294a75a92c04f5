import { can } from '../../../shared/auth/permissions.ts';
import type { Actor } from '../../../shared/auth/roles.ts';
import {
  isStaffRole,
  type Member,
  type MemberUpdateInput,
  type Workshop,
  type WorkshopCreateInput,
  type WorkshopUpdateInput,
} from '../../../shared/workshops/workshop-schemas.ts';
import { withTransaction } from '../../db/sequelize.ts';
import { AppError, forbidden } from '../../lib/app-error.ts';
import * as repo from './workshops-repository.ts';

export const membershipsOf = repo.membershipsOf;
export const workshopName = repo.workshopName;
export const mentorIdsOf = repo.mentorIdsOf;

/**
 * The actor for a user inside one workshop, or a 404 that looks the same
 * whether the workshop does not exist or the user is not in it.
 */
export async function actorIn(workshopId: string, userId: string): Promise<Actor> {
  const role = await repo.findRole(workshopId, userId);
  if (!role) throw new AppError('workshop-not-found', 'Workshop not found', 404);
  return { id: userId, role };
}

/**
 * The actor for requireMember: as actorIn, and a mentor or admin of a
 * workshop that requires two-step sign-in of its staff gets 403 mfa-required
 * until their account has it on. Students and casters are not affected.
 */
export async function memberActor(workshopId: string, userId: string): Promise<Actor> {
  const access = await repo.findAccess(workshopId, userId);
  if (!access) throw new AppError('workshop-not-found', 'Workshop not found', 404);
  if (access.requireMfaForStaff && isStaffRole(access.role) && !access.mfaEnabled) {
    throw new AppError(
      'mfa-required',
      'This workshop asks its mentors and admins to use two-step sign-in. Turn it on in your settings to carry on here.',
      403,
    );
  }
  return { id: userId, role: access.role };
}

/**
 * An admin changes the workshop's settings. Requiring two-step sign-in of
 * staff is refused while the admin's own account lacks it: they would lock
 * themselves out of the workshop the moment it took effect.
 */
export async function updateWorkshop(actor: Actor, workshopId: string, input: WorkshopUpdateInput): Promise<Workshop> {
  if (!can(actor, 'update', 'workshop')) throw forbidden('Only the workshop’s admins change its settings');
  if (input.requireMfaForStaff) {
    const own = await repo.findAccess(workshopId, actor.id);
    if (!own?.mfaEnabled) {
      throw new AppError(
        'mfa-needed-first',
        'Turn on two-step sign-in for your own account first (in Settings), so requiring it does not lock you out of this workshop.',
        409,
      );
    }
  }
  await repo.setRequireMfaForStaff(workshopId, input.requireMfaForStaff);
  return (await repo.workshopsOf(actor.id)).find((w) => w.id === workshopId)!;
}

export async function listWorkshops(userId: string): Promise<Workshop[]> {
  return repo.workshopsOf(userId);
}

/** A new workshop with its creator as the first admin. */
export async function createWorkshop(userId: string, input: Required<WorkshopCreateInput>): Promise<Workshop> {
  const id = await withTransaction(async (tx) => {
    const workshopId = await repo.createWorkshop({ ...input, createdBy: userId }, tx);
    await repo.addMember(workshopId, userId, 'admin', tx);
    return workshopId;
  });
  const created = (await repo.workshopsOf(userId)).find((w) => w.id === id);
  return created!;
}

export async function listMembers(actor: Actor, workshopId: string): Promise<Member[]> {
  if (!can(actor, 'read', 'member')) throw forbidden();
  return repo.listMembers(workshopId);
}

/** Adds a member (used when an invitation is accepted). */
export const addMember = repo.addMember;
export const findRole = repo.findRole;

/**
 * An admin changes a member's role and, for a student, their mentors. The
 * workshop always keeps at least one admin.
 */
export async function updateMember(actor: Actor, workshopId: string, input: MemberUpdateInput): Promise<Member> {
  if (!can(actor, 'manage', 'member')) throw forbidden('Only the workshop’s admins manage members');
  return withTransaction(async (tx) => {
    const members = await repo.listMembers(workshopId, tx);
    const target = members.find((m) => m.userId === input.userId);
    if (!target) throw new AppError('member-not-found', 'That person is not a member of this workshop', 404);
    const newRole = input.role ?? target.role;
    if (target.role === 'admin' && newRole !== 'admin' && (await repo.countAdmins(workshopId, tx)) <= 1) {
      throw new AppError('last-admin', 'A workshop needs at least one admin; make someone else admin first', 409);
    }
    if (newRole !== target.role) await repo.setRole(workshopId, input.userId, newRole, tx);
    if (input.mentorIds) {
      if (newRole !== 'student') {
        throw new AppError('not-a-student', 'Mentors are assigned to students only', 400);
      }
      const mentorIds = [...new Set(input.mentorIds)];
      const mentors = new Set(members.filter((m) => m.role === 'mentor' || m.role === 'admin').map((m) => m.userId));
      const unknown = mentorIds.filter((id) => !mentors.has(id));
      if (unknown.length) {
        throw new AppError('not-a-mentor', 'Pick mentors (or admins) of this workshop', 400);
      }
      await repo.setMentors(workshopId, input.userId, mentorIds, tx);
    } else if (newRole !== 'student' && target.role === 'student') {
      await repo.setMentors(workshopId, input.userId, [], tx);
    }
    const updated = (await repo.listMembers(workshopId, tx)).find((m) => m.userId === input.userId);
    return updated!;
  });
}

export async function removeMember(actor: Actor, workshopId: string, userId: string): Promise<void> {
  if (!can(actor, 'manage', 'member')) throw forbidden('Only the workshop’s admins manage members');
  await withTransaction(async (tx) => {
    const role = await repo.findRole(workshopId, userId);
    if (!role) throw new AppError('member-not-found', 'That person is not a member of this workshop', 404);
    if (role === 'admin' && (await repo.countAdmins(workshopId, tx)) <= 1) {
      throw new AppError('last-admin', 'A workshop needs at least one admin; make someone else admin first', 409);
    }
    await repo.removeMember(workshopId, userId, tx);
  });
}
