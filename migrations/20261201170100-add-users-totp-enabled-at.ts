import { DataTypes, type QueryInterface } from 'sequelize';

// When the account confirmed its authenticator with a code; null while MFA is
// off or only pending. An enabled account always has a secret.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn('users', 'totp_enabled_at', { type: DataTypes.DATE, allowNull: true });
  await qi.sequelize.query(
    'ALTER TABLE users ADD CONSTRAINT users_totp_enabled_has_secret CHECK (totp_enabled_at IS NULL OR totp_secret IS NOT NULL)',
  );
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.query('ALTER TABLE users DROP CONSTRAINT users_totp_enabled_has_secret');
  await qi.removeColumn('users', 'totp_enabled_at');
}
