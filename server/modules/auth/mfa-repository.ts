import { QueryTypes } from 'sequelize';
import { sequelize, type Tx } from '../../db/sequelize.ts';
import { RecoveryCodeModel } from './recovery-code-model.ts';
import { UserModel } from './user-model.ts';

export type TotpState = {
  /** Sealed (server/lib/secret-box.ts); null when MFA was never set up or was turned off. */
  sealedSecret: string | null;
  enabledAt: Date | null;
  lastStep: number | null;
};

export async function findTotpState(userId: string): Promise<TotpState | null> {
  const u = await UserModel.findByPk(userId, { attributes: ['totpSecret', 'totpEnabledAt', 'totpLastStep'], raw: true });
  return u ? { sealedSecret: u.totpSecret, enabledAt: u.totpEnabledAt, lastStep: u.totpLastStep } : null;
}

/** Stores a new pending secret; never over an enabled one. False when MFA is already on. */
export async function setPendingSecret(userId: string, sealedSecret: string): Promise<boolean> {
  const [count] = await UserModel.update(
    { totpSecret: sealedSecret, totpLastStep: null },
    { where: { id: userId, totpEnabledAt: null } },
  );
  return count === 1;
}

/** Turns the pending secret on, with the step of the code that confirmed it already spent. */
export async function enable(userId: string, step: number, tx: Tx): Promise<boolean> {
  const [, count] = await sequelize.query(
    `UPDATE users SET totp_enabled_at = now(), totp_last_step = :step, updated_at = now()
      WHERE id = :userId AND totp_enabled_at IS NULL AND totp_secret IS NOT NULL`,
    { replacements: { userId, step }, type: QueryTypes.UPDATE, transaction: tx },
  );
  return count === 1;
}

/**
 * Records `step` as the last one used, only if it is later than the one
 * stored. One conditional UPDATE, so two requests with the same code race
 * safely: one wins, the other is a replay.
 */
export async function claimStep(userId: string, step: number): Promise<boolean> {
  const [, count] = await sequelize.query(
    `UPDATE users SET totp_last_step = :step
      WHERE id = :userId AND totp_enabled_at IS NOT NULL AND (totp_last_step IS NULL OR totp_last_step < :step)`,
    { replacements: { userId, step }, type: QueryTypes.UPDATE },
  );
  return count === 1;
}

export async function disable(userId: string, tx: Tx): Promise<void> {
  await UserModel.update(
    { totpSecret: null, totpEnabledAt: null, totpLastStep: null },
    { where: { id: userId }, transaction: tx },
  );
  await RecoveryCodeModel.destroy({ where: { userId }, transaction: tx });
}

/** Replaces every recovery code of the user with these (hashes). */
export async function replaceRecoveryCodes(userId: string, codeHashes: string[], tx: Tx): Promise<void> {
  await RecoveryCodeModel.destroy({ where: { userId }, transaction: tx });
  await RecoveryCodeModel.bulkCreate(codeHashes.map((codeHash) => ({ userId, codeHash })), { transaction: tx });
}

/** Marks the code used if it is the user's and unused; one UPDATE, so it works once. */
export async function useRecoveryCode(userId: string, codeHash: string): Promise<boolean> {
  const [count] = await RecoveryCodeModel.update(
    { usedAt: new Date() },
    { where: { userId, codeHash, usedAt: null } },
  );
  return count === 1;
}

export async function countUnusedRecoveryCodes(userId: string): Promise<number> {
  return RecoveryCodeModel.count({ where: { userId, usedAt: null } });
}
