import { Op } from 'sequelize';
import type { Tx } from '../../db/sequelize.ts';
import { PasswordResetTokenModel } from './password-reset-token-model.ts';

export async function create(userId: string, tokenHash: string, expiresAt: Date): Promise<void> {
  await PasswordResetTokenModel.create({ userId, tokenHash, expiresAt });
}

/**
 * Marks the token used if it is still usable and returns its user. One
 * UPDATE … WHERE used_at IS NULL, so two clicks race safely: one wins.
 */
export async function consume(tokenHash: string, tx: Tx): Promise<string | null> {
  const [count, rows] = await PasswordResetTokenModel.update(
    { usedAt: new Date() },
    {
      where: { tokenHash, usedAt: null, expiresAt: { [Op.gt]: new Date() } },
      returning: true,
      transaction: tx,
    },
  );
  return count === 1 ? rows[0].userId : null;
}
