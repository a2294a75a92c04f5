import { DataTypes, type QueryInterface } from 'sequelize';

// One-time recovery codes for signing in without the authenticator. Only the
// SHA-256 of each code is stored: the codes carry 120 random bits, so a slow
// password hash adds nothing (ASVS 5.0 V6.5.2).
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('recovery_codes', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    user_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    code_hash: { type: DataTypes.STRING(64), allowNull: false },
    used_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('recovery_codes', ['user_id', 'code_hash'], { unique: true, name: 'recovery_codes_user_code' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('recovery_codes');
}
