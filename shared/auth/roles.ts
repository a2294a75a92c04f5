import { z } from 'zod';

/** A membership's role in one workshop; a user can hold a different role in each. */
export const ROLES = ['student', 'caster', 'mentor', 'admin'] as const;
export type Role = (typeof ROLES)[number];
export const roleSchema = z.enum(ROLES);

export const ROLE_LABELS: Record<Role, string> = {
  student: 'Student',
  caster: 'Caster',
  mentor: 'Mentor',
  admin: 'Admin',
};

/** Who is acting, inside one workshop. */
export type Actor = { id: string; role: Role };
