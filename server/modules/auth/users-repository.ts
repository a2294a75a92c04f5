import { QueryTypes } from 'sequelize';
import { sequelize, type Tx } from '../../db/sequelize.ts';
import { UserModel } from './user-model.ts';

export type UserRow = {
  id: string;
  email: string;
  passwordHash: string;
  displayName: string;
  temperatureUnit: 'C' | 'F';
  massUnit: 'g' | 'oz';
  theme: 'system' | 'light' | 'dark';
  /** Set once the account confirmed an authenticator; sign-in then asks for a code. */
  totpEnabledAt: Date | null;
};

// The sealed one-time-code secret stays in the MFA repository's reads only.
const plain = (u: UserModel | null): UserRow | null => {
  if (!u) return null;
  const { totpSecret: _secret, totpLastStep: _step, ...row } = u.get({ plain: true });
  return row as UserRow;
};

export async function findByEmail(email: string): Promise<UserRow | null> {
  return plain(await UserModel.findOne({ where: { email } }));
}

export async function findById(id: string): Promise<UserRow | null> {
  return plain(await UserModel.findByPk(id));
}

export async function create(
  values: Pick<UserRow, 'email' | 'passwordHash' | 'displayName'> & Partial<Pick<UserRow, 'temperatureUnit' | 'massUnit'>>,
  tx?: Tx,
): Promise<UserRow> {
  return plain(await UserModel.create(values, { transaction: tx }))!;
}

export async function update(
  id: string,
  values: Partial<Pick<UserRow, 'displayName' | 'temperatureUnit' | 'massUnit' | 'theme'>>,
): Promise<void> {
  await UserModel.update(values, { where: { id } });
}

export async function setPasswordHash(id: string, passwordHash: string, tx?: Tx): Promise<void> {
  await UserModel.update({ passwordHash, passwordChangedAt: new Date() }, { where: { id }, transaction: tx });
}

/** Ends every stored session of a user, optionally keeping one (the caller's own). */
export async function endSessions(userId: string, exceptSid?: string, tx?: Tx): Promise<void> {
  await sequelize.query('DELETE FROM sessions WHERE user_id = :userId AND sid <> :exceptSid', {
    replacements: { userId, exceptSid: exceptSid ?? '' },
    type: QueryTypes.DELETE,
    transaction: tx,
  });
}
