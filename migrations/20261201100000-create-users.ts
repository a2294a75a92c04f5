import { DataTypes, type QueryInterface } from 'sequelize';

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('users', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
    password_hash: { type: DataTypes.STRING(100), allowNull: false },
    display_name: { type: DataTypes.STRING(80), allowNull: false },
    temperature_unit: { type: DataTypes.STRING(1), allowNull: false, defaultValue: 'C' },
    mass_unit: { type: DataTypes.STRING(2), allowNull: false, defaultValue: 'g' },
    theme: { type: DataTypes.STRING(6), allowNull: false, defaultValue: 'system' },
    password_changed_at: { type: DataTypes.DATE, allowNull: false, defaultValue: qi.sequelize.fn('now') },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.sequelize.query(`
    ALTER TABLE users
      ADD CONSTRAINT users_email_lowercase CHECK (email = lower(email)),
      ADD CONSTRAINT users_temperature_unit CHECK (temperature_unit IN ('C','F')),
      ADD CONSTRAINT users_mass_unit CHECK (mass_unit IN ('g','oz')),
      ADD CONSTRAINT users_theme CHECK (theme IN ('system','light','dark'))`);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('users');
}
