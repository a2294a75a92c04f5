import { DataTypes, type QueryInterface } from 'sequelize';

// How each user wants notifications by e-mail; no row means immediately.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('notification_preferences', {
    user_id: { type: DataTypes.UUID, primaryKey: true, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    email: { type: DataTypes.STRING(9), allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.sequelize.query(
    `ALTER TABLE notification_preferences ADD CONSTRAINT notification_preferences_email CHECK (email IN ('immediate','daily','off'))`,
  );
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('notification_preferences');
}
