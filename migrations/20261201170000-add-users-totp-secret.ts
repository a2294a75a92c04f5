import { DataTypes, type QueryInterface } from 'sequelize';

// The account's one-time-code secret, encrypted with AES-256-GCM by
// server/lib/secret-box.ts ("v1.<iv>.<tag>.<ciphertext>", base64url), never
// in the clear. Set by MFA setup; it stays pending until totp_enabled_at is set.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn('users', 'totp_secret', { type: DataTypes.STRING(200), allowNull: true });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeColumn('users', 'totp_secret');
}
