import { DataTypes, type QueryInterface } from 'sequelize';

// The 30-second time step of the last code accepted for this account: a code
// from that step or an earlier one is refused, so an overheard code cannot be
// replayed while it is still inside the ±1 step window (RFC 6238 §5.2).
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn('users', 'totp_last_step', { type: DataTypes.INTEGER, allowNull: true });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeColumn('users', 'totp_last_step');
}
