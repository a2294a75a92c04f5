import { z } from 'zod';
import { roleSchema } from './roles.ts';

// Length limits follow NIST SP 800-63B §3.1.1.2: at least 8 characters, no
// composition rules, and room for long passphrases. bcrypt reads only the
// first 72 bytes, so the server pre-hashes longer secrets (see password.ts).
export const PASSWORD_MIN_LENGTH = 8;
export const PASSWORD_MAX_LENGTH = 128;

export const emailSchema = z
  .string()
  .trim()
  .toLowerCase()
  .max(254, 'An e-mail address has at most 254 characters')
  .pipe(z.email('Enter a valid e-mail address'));

export const passwordSchema = z
  .string()
  .min(PASSWORD_MIN_LENGTH, `Use at least ${PASSWORD_MIN_LENGTH} characters`)
  .max(PASSWORD_MAX_LENGTH, `Use at most ${PASSWORD_MAX_LENGTH} characters`);

export const displayNameSchema = z
  .string()
  .trim()
  .min(1, 'Enter your name')
  .max(80, 'A name has at most 80 characters');

export const TEMPERATURE_UNITS = ['C', 'F'] as const;
export const MASS_UNITS = ['g', 'oz'] as const;
export const THEMES = ['system', 'light', 'dark'] as const;
export const temperatureUnitPrefSchema = z.enum(TEMPERATURE_UNITS);
export const massUnitPrefSchema = z.enum(MASS_UNITS);
export const themeSchema = z.enum(THEMES);

export const signUpInputSchema = z.object({
  email: emailSchema,
  password: passwordSchema,
  displayName: displayNameSchema,
  temperatureUnit: temperatureUnitPrefSchema.default('C'),
  massUnit: massUnitPrefSchema.default('g'),
});
export type SignUpInput = z.input<typeof signUpInputSchema>;

export const signInInputSchema = z.object({
  email: emailSchema,
  // Sign-in accepts any non-empty password so an old, shorter one still gets
  // the ordinary "wrong e-mail or password" answer rather than a form error.
  password: z.string().min(1, 'Enter your password').max(1024),
});
export type SignInInput = z.infer<typeof signInInputSchema>;

export const passwordResetRequestSchema = z.object({ email: emailSchema });
export type PasswordResetRequest = z.infer<typeof passwordResetRequestSchema>;

export const tokenSchema = z
  .string()
  .regex(/^[A-Za-z0-9_-]{32,128}$/, 'This link is not valid');

export const passwordResetConfirmSchema = z.object({
  token: tokenSchema,
  password: passwordSchema,
});
export type PasswordResetConfirm = z.infer<typeof passwordResetConfirmSchema>;

/** POST /api/auth/password: the current password again, and the new one. */
export const passwordChangeSchema = z.object({
  currentPassword: z.string().min(1, 'Enter your current password').max(1024),
  newPassword: passwordSchema,
});
export type PasswordChangeInput = z.infer<typeof passwordChangeSchema>;

export const preferencesUpdateSchema = z
  .object({
    displayName: displayNameSchema,
    temperatureUnit: temperatureUnitPrefSchema,
    massUnit: massUnitPrefSchema,
    theme: themeSchema,
  })
  .partial();
export type PreferencesUpdate = z.infer<typeof preferencesUpdateSchema>;

export const membershipSummarySchema = z.object({
  workshopId: z.uuid(),
  workshopName: z.string(),
  role: roleSchema,
});

export const currentUserSchema = z.object({
  id: z.uuid(),
  email: z.string(),
  displayName: z.string(),
  temperatureUnit: temperatureUnitPrefSchema,
  massUnit: massUnitPrefSchema,
  theme: themeSchema,
  /** Whether signing in asks for a one-time code as well. */
  mfaEnabled: z.boolean().default(false),
  memberships: z.array(membershipSummarySchema),
});
export type CurrentUser = z.infer<typeof currentUserSchema>;

/** GET /api/auth/me: the signed-in user (or null) and the session's CSRF token. */
export const sessionStateSchema = z.object({
  user: currentUserSchema.nullable(),
  csrfToken: z.string(),
});
export type SessionState = z.infer<typeof sessionStateSchema>;
