import { can } from '../../../shared/auth/permissions.ts';
import { ROLE_LABELS, type Actor } from '../../../shared/auth/roles.ts';
import type {
  Invitation,
  InvitationAcceptInput,
  InvitationCreateInput,
  InvitationPreview,
} from '../../../shared/workshops/workshop-schemas.ts';
import { config } from '../../config.ts';
import { withTransaction } from '../../db/sequelize.ts';
import { AppError, forbidden } from '../../lib/app-error.ts';
import { mailLayout } from '../../lib/mailer.ts';
import { queueMail } from '../../lib/mail-queue.ts';
import { hashToken, newLinkToken } from '../../lib/tokens.ts';
import * as authService from '../auth/auth-service.ts';
import * as workshopsService from '../workshops/workshops-service.ts';
import * as repo from './invitations-repository.ts';

export const INVITATION_LIFETIME_MS = 7 * 24 * 3600 * 1000;

const invalid = () =>
  new AppError('invitation-invalid', 'This invitation has expired or was already used. Ask the workshop admin for a new one.', 404);

export async function listInvitations(actor: Actor, workshopId: string): Promise<Invitation[]> {
  if (!can(actor, 'manage', 'invitation')) throw forbidden('Only the workshop’s admins see invitations');
  return repo.list(workshopId);
}

/** Stores the invitation and queues the mail with its link. */
export async function invite(actor: Actor, workshopId: string, input: InvitationCreateInput): Promise<Invitation> {
  if (!can(actor, 'manage', 'invitation')) throw forbidden('Only the workshop’s admins invite people');
  const token = newLinkToken();
  const id = await repo.create({
    workshopId,
    email: input.email,
    role: input.role,
    tokenHash: hashToken(token),
    invitedBy: actor.id,
    expiresAt: new Date(Date.now() + INVITATION_LIFETIME_MS),
  });
  const workshop = (await workshopsService.workshopName(workshopId)) ?? 'a workshop';
  const url = `${config().http.origin}/invitations/${token}`;
  const role = ROLE_LABELS[input.role].toLowerCase();
  await queueMail({
    to: input.email,
    subject: `You are invited to ${workshop} on Pourscope`,
    text: `You have been invited to join ${workshop} as a ${role}.\n\nAccept within 7 days: ${url}\n\nThe link works once.`,
    html: mailLayout({
      heading: `Join ${workshop}`,
      paragraphs: [`You have been invited to join ${workshop} on Pourscope as a ${role}.`, 'The link works once and expires in 7 days.'],
      action: { label: 'Accept the invitation', url },
    }),
  });
  return (await repo.list(workshopId)).find((i) => i.id === id)!;
}

export async function preview(token: string): Promise<InvitationPreview> {
  const inv = await repo.findUsable(hashToken(token));
  if (!inv) throw invalid();
  return {
    workshopName: (await workshopsService.workshopName(inv.workshopId)) ?? '',
    role: inv.role,
    email: inv.email,
    accountExists: (await authService.findAccountByEmail(inv.email)) !== null,
  };
}

/**
 * Accepts once. A signed-in user joins as themselves (their e-mail must be
 * the invited one); without a session, a new account is made for the invited
 * e-mail. Returns the user to sign in and the workshop joined.
 */
export async function accept(
  token: string,
  signedInUserId: string | undefined,
  input: InvitationAcceptInput,
): Promise<{ userId: string; workshopId: string }> {
  const tokenHash = hashToken(token);
  const inv = await repo.findUsable(tokenHash);
  if (!inv) throw invalid();

  let userId: string;
  let newAccount: { displayName: string; password: string } | undefined;
  if (signedInUserId) {
    const user = await authService.currentUser(signedInUserId);
    if (!user || user.email !== inv.email) {
      throw new AppError('invitation-other-account', `This invitation is for ${inv.email}; sign in with that address`, 403);
    }
    userId = user.id;
  } else {
    const existing = await authService.findAccountByEmail(inv.email);
    if (existing) throw new AppError('sign-in-first', `Sign in as ${inv.email} to accept this invitation`, 409);
    if (!('password' in input)) {
      throw new AppError('account-details-needed', 'Give your name and a password to create your account', 400);
    }
    newAccount = { displayName: input.displayName, password: input.password };
    userId = '';
  }

  return withTransaction(async (tx) => {
    if (newAccount) {
      userId = (await authService.createAccount({ email: inv.email, ...newAccount }, tx)).id;
    }
    const consumed = await repo.consume(tokenHash, userId, tx);
    if (!consumed) throw invalid();
    const role = await workshopsService.findRole(consumed.workshopId, userId);
    if (!role) await workshopsService.addMember(consumed.workshopId, userId, consumed.role, tx);
    return { userId, workshopId: consumed.workshopId };
  });
}
