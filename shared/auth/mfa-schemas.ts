import { z } from 'zod';
import { sessionStateSchema } from './auth-schemas.ts';

// Two-step sign-in: a time-based one-time code (RFC 6238: 30 s steps, 6
// digits) from an authenticator app, or one of ten single-use recovery codes.

export const TOTP_DIGITS = 6;
export const TOTP_PERIOD_SECONDS = 30;
export const RECOVERY_CODE_COUNT = 10;
/** Crockford's base32: no i, l, o or u, so a code read aloud or off paper is not misread. */
export const RECOVERY_CODE_ALPHABET = '0123456789abcdefghjkmnpqrstvwxyz';
/** 24 characters of 5 bits: 120 random bits each. */
export const RECOVERY_CODE_LENGTH = 24;

const compact = (s: string) => s.replace(/[\s-]/g, '');

/**
 * A recovery code as stored (hashed) and compared: lower case, without the
 * spaces and hyphens it was shown with, and with the letters people mistake
 * for digits (o, i, l) read as those digits.
 */
export function normalizeRecoveryCode(input: string): string {
  return compact(input).toLowerCase().replace(/o/g, '0').replace(/[il]/g, '1');
}

/** A recovery code split into groups of four for display: "7k2m-9xqa-…". */
export function formatRecoveryCode(code: string): string {
  return code.match(/.{1,4}/g)?.join('-') ?? code;
}

const RECOVERY_CODE_PATTERN = new RegExp(`^[${RECOVERY_CODE_ALPHABET}]{${RECOVERY_CODE_LENGTH}}$`);
const TOTP_CODE_PATTERN = new RegExp(`^\\d{${TOTP_DIGITS}}$`);

export const totpCodeSchema = z
  .string()
  .max(20)
  .transform(compact)
  .pipe(z.string().regex(TOTP_CODE_PATTERN, 'Enter the 6-digit code from your authenticator app'));

export const recoveryCodeSchema = z
  .string()
  .max(64)
  .transform(normalizeRecoveryCode)
  .pipe(z.string().regex(RECOVERY_CODE_PATTERN, 'Enter a recovery code as it was shown: 24 letters and digits'));

/** Either second factor, told apart by shape: six digits, or a recovery code. */
export const secondFactorSchema = z
  .string()
  .max(64)
  .transform((raw, ctx) => {
    const code = compact(raw);
    if (TOTP_CODE_PATTERN.test(code)) return { kind: 'totp' as const, value: code };
    const recovery = normalizeRecoveryCode(raw);
    if (RECOVERY_CODE_PATTERN.test(recovery)) return { kind: 'recovery' as const, value: recovery };
    ctx.addIssue({ code: 'custom', message: 'Enter the 6-digit code from your authenticator app, or a recovery code' });
    return z.NEVER;
  });
export type SecondFactor = z.output<typeof secondFactorSchema>;

/** Password as typed for re-confirmation; any length, so the usual 401 answers a wrong one. */
const currentPasswordSchema = z.string().min(1, 'Enter your password').max(1024);

/** POST /api/auth/mfa/setup */
export const mfaSetupInputSchema = z.object({ password: currentPasswordSchema });
export type MfaSetupInput = z.infer<typeof mfaSetupInputSchema>;

export const mfaSetupSchema = z.object({
  /** Base32, for typing into an app that cannot scan. */
  secret: z.string(),
  otpauthUri: z.string(),
  /** The otpauth URI as a QR code, an SVG data URL. */
  qrDataUrl: z.string(),
});
export type MfaSetup = z.infer<typeof mfaSetupSchema>;

/** POST /api/auth/mfa/enable */
export const mfaEnableInputSchema = z.object({ code: totpCodeSchema });
export type MfaEnableInput = z.input<typeof mfaEnableInputSchema>;

/** POST /api/auth/mfa/disable and /api/auth/mfa/recovery-codes: the password and a current second factor. */
export const mfaConfirmInputSchema = z.object({ password: currentPasswordSchema, code: secondFactorSchema });
export type MfaConfirmInput = z.input<typeof mfaConfirmInputSchema>;

export const recoveryCodesSchema = z.object({ recoveryCodes: z.array(z.string()).length(RECOVERY_CODE_COUNT) });
export type RecoveryCodes = z.infer<typeof recoveryCodesSchema>;

/** POST /api/auth/sign-in/mfa: the code from the app, or a recovery code instead. */
export const signInMfaInputSchema = z
  .object({ code: totpCodeSchema.optional(), recoveryCode: recoveryCodeSchema.optional() })
  .refine((v) => (v.code === undefined) !== (v.recoveryCode === undefined), {
    message: 'Send either the code from your authenticator app or a recovery code',
  });
export type SignInMfaInput = z.input<typeof signInMfaInputSchema>;

/** The password was right and the account has two-step sign-in: the code comes next. */
export const mfaChallengeSchema = z.object({ mfaRequired: z.literal(true), csrfToken: z.string() });

/** POST /api/auth/sign-in answers either a signed-in session or the code step. */
export const signInResultSchema = z.union([mfaChallengeSchema, sessionStateSchema]);
export type SignInResult = z.infer<typeof signInResultSchema>;

/** POST /api/auth/sign-in/mfa: signed in; after a recovery code, how many are left. */
export const signInMfaResultSchema = sessionStateSchema.extend({ recoveryCodesLeft: z.number().int().optional() });
export type SignInMfaResult = z.infer<typeof signInMfaResultSchema>;
