import { DataTypes, type QueryInterface } from 'sequelize';

// A workshop's admins can require two-step sign-in of everyone who holds a
// mentor or admin role there (they see every member's work).
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn('workshops', 'require_mfa_for_staff', { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeColumn('workshops', 'require_mfa_for_staff');
}
