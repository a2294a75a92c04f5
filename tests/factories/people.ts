import { faker } from '@faker-js/faker';
import type { Role } from '../../shared/auth/roles.ts';
import { hashPassword } from '../../server/lib/password.ts';
import { MembershipModel, MentorAssignmentModel, WorkshopModel } from '../../server/modules/workshops/workshop-model.ts';
import { UserModel } from '../../server/modules/auth/user-model.ts';

export const FACTORY_PASSWORD = 'molten-aluminium-42';
let cachedHash: Promise<string> | undefined;
// One bcrypt hash (cost 12) shared by every factory user keeps the suite fast.
const passwordHash = () => (cachedHash ??= hashPassword(FACTORY_PASSWORD, 12));

let counter = 0;
/** A unique e-mail; faker's words plus a counter and the time never repeat. */
export function uniqueEmail(): string {
  counter += 1;
  return `${faker.internet.username().toLowerCase().replace(/[^a-z0-9]/g, '')}.${Date.now().toString(36)}${counter}@example.test`;
}

export type InsertedUser = { id: string; email: string; displayName: string; password: string };

export async function insertUser(overrides: Partial<{ email: string; displayName: string }> = {}): Promise<InsertedUser> {
  const user = await UserModel.create({
    email: overrides.email ?? uniqueEmail(),
    displayName: overrides.displayName ?? faker.person.fullName(),
    passwordHash: await passwordHash(),
  });
  return { id: user.id, email: user.email, displayName: user.displayName, password: FACTORY_PASSWORD };
}

export async function insertWorkshop(overrides: Partial<{ name: string }> = {}): Promise<{ id: string; name: string }> {
  const w = await WorkshopModel.create({
    name: overrides.name ?? `${faker.location.city()} casting club`,
    kind: 'makerspace',
    createdBy: null,
  });
  return { id: w.id, name: w.name };
}

export async function insertMember(workshopId: string, role: Role, overrides: Partial<{ email: string }> = {}) {
  const user = await insertUser(overrides);
  await MembershipModel.create({ workshopId, userId: user.id, role });
  return user;
}

export async function assignMentor(workshopId: string, mentorId: string, studentId: string) {
  await MentorAssignmentModel.create({ workshopId, mentorId, studentId });
}

/** A workshop with one member of each role. */
export async function insertWorkshopWithCrew() {
  const workshop = await insertWorkshop();
  const [admin, mentor, caster, student] = await Promise.all([
    insertMember(workshop.id, 'admin'),
    insertMember(workshop.id, 'mentor'),
    insertMember(workshop.id, 'caster'),
    insertMember(workshop.id, 'student'),
  ]);
  return { workshop, admin, mentor, caster, student };
}
