import { z } from 'zod';
import { emailSchema, tokenSchema, displayNameSchema, passwordSchema } from '../auth/auth-schemas.ts';
import { roleSchema, type Role } from '../auth/roles.ts';

export const WORKSHOP_KINDS = ['school', 'makerspace', 'foundry', 'home'] as const;
export const workshopKindSchema = z.enum(WORKSHOP_KINDS);
export const WORKSHOP_KIND_LABELS: Record<(typeof WORKSHOP_KINDS)[number], string> = {
  school: 'School or college class',
  makerspace: 'Makerspace or club',
  foundry: 'Small foundry',
  home: 'Home workshop',
};

export const workshopIdParamsSchema = z.object({ workshopId: z.uuid('Unknown workshop') });
export const memberParamsSchema = workshopIdParamsSchema.extend({ userId: z.uuid('Unknown member') });
export const invitationTokenParamsSchema = z.object({ token: tokenSchema });

export const workshopCreateSchema = z.object({
  name: z.string().trim().min(2, 'Give the workshop a name').max(120),
  kind: workshopKindSchema.default('makerspace'),
});
export type WorkshopCreateInput = z.input<typeof workshopCreateSchema>;

export const workshopSchema = z.object({
  id: z.uuid(),
  name: z.string(),
  kind: workshopKindSchema,
  role: roleSchema,
  memberCount: z.number().int(),
  createdAt: z.string(),
  /** Mentors and admins must use two-step sign-in to work in this workshop. */
  requireMfaForStaff: z.boolean().default(false),
});
export type Workshop = z.infer<typeof workshopSchema>;

/** The roles a workshop's two-step requirement applies to: they see every member's work. */
export const STAFF_ROLES = ['mentor', 'admin'] as const satisfies readonly Role[];
export const isStaffRole = (role: Role) => (STAFF_ROLES as readonly Role[]).includes(role);

/** PATCH /workshops/:workshopId (admins). */
export const workshopUpdateSchema = z.object({ requireMfaForStaff: z.boolean() });
export type WorkshopUpdateInput = z.infer<typeof workshopUpdateSchema>;

export const memberSchema = z.object({
  userId: z.uuid(),
  displayName: z.string(),
  email: z.string(),
  role: roleSchema,
  mentorIds: z.array(z.uuid()),
  joinedAt: z.string(),
});
export type Member = z.infer<typeof memberSchema>;

/** POST /members: an admin changes a member's role and, for students, their mentors. */
export const memberUpdateSchema = z.object({
  userId: z.uuid(),
  role: roleSchema.optional(),
  mentorIds: z.array(z.uuid()).max(20).optional(),
});
export type MemberUpdateInput = z.infer<typeof memberUpdateSchema>;

export const invitationCreateSchema = z.object({
  email: emailSchema,
  role: roleSchema,
});
export type InvitationCreateInput = z.infer<typeof invitationCreateSchema>;

export const invitationSchema = z.object({
  id: z.uuid(),
  email: z.string(),
  role: roleSchema,
  expiresAt: z.string(),
  acceptedAt: z.string().nullable(),
  invitedBy: z.string(),
});
export type Invitation = z.infer<typeof invitationSchema>;

/** What an invitation link shows before it is accepted. */
export const invitationPreviewSchema = z.object({
  workshopName: z.string(),
  role: roleSchema,
  email: z.string(),
  accountExists: z.boolean(),
});
export type InvitationPreview = z.infer<typeof invitationPreviewSchema>;

/**
 * Accepting: a signed-in user joins as themselves; someone without an account
 * gives a name and password and the account is created for the invited e-mail.
 */
export const invitationAcceptSchema = z.union([
  z.object({}).strict(),
  z.object({ displayName: displayNameSchema, password: passwordSchema }),
]);
export type InvitationAcceptInput = z.infer<typeof invitationAcceptSchema>;
