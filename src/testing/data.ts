import type { CurrentUser, SessionState } from '#shared/auth/auth-schemas.ts';
import type { Role } from '#shared/auth/roles.ts';
import type { Member, Workshop } from '#shared/workshops/workshop-schemas.ts';

let counter = 0;
/** A valid version-4 UUID, different on each call. */
export function testId(): string {
  counter += 1;
  return `00000000-0000-4000-8000-${counter.toString(16).padStart(12, '0')}`;
}

export function buildUser(overrides: Partial<CurrentUser> = {}): CurrentUser {
  return {
    id: testId(),
    email: 'ada@example.test',
    displayName: 'Ada Caster',
    temperatureUnit: 'C',
    massUnit: 'g',
    theme: 'system',
    mfaEnabled: false,
    memberships: [],
    ...overrides,
  };
}

export function buildSession(user: CurrentUser | null, csrfToken = 'csrf-token-1'): SessionState {
  return { user, csrfToken };
}

export function buildWorkshop(overrides: Partial<Workshop> = {}): Workshop {
  return {
    id: testId(),
    name: 'Night class foundry',
    kind: 'school',
    role: 'student' as Role,
    memberCount: 3,
    createdAt: '2026-01-10T09:00:00.000Z',
    requireMfaForStaff: false,
    ...overrides,
  };
}

export function buildMember(overrides: Partial<Member> = {}): Member {
  return {
    userId: testId(),
    displayName: 'Ben Pourer',
    email: 'ben@example.test',
    role: 'student',
    mentorIds: [],
    joinedAt: '2026-01-12T09:00:00.000Z',
    ...overrides,
  };
}
