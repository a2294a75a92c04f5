import { DataTypes, type QueryInterface } from 'sequelize';

// In-app notifications, kept whatever the e-mail preference. `mail` is the
// preference in force when it was made; `mailed_at` is set once its mail (or
// the digest holding it) is queued, so the digest finds what is still unsent.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('notifications', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    user_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    workshop_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'workshops', key: 'id' }, onDelete: 'CASCADE' },
    kind: { type: DataTypes.STRING(20), allowNull: false },
    report_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'reports', key: 'id' }, onDelete: 'CASCADE' },
    comment_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'comments', key: 'id' }, onDelete: 'SET NULL' },
    actor_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    title: { type: DataTypes.STRING(200), allowNull: false },
    body: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    link: { type: DataTypes.STRING(300), allowNull: false },
    mail: { type: DataTypes.STRING(9), allowNull: false },
    mailed_at: { type: DataTypes.DATE, allowNull: true },
    read_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.sequelize.query(`
    ALTER TABLE notifications ADD CONSTRAINT notifications_mail CHECK (mail IN ('immediate','daily','off'))`);
  await qi.addIndex('notifications', ['user_id', 'created_at', 'id'], { name: 'notifications_user_created' });
  await qi.sequelize.query(
    `CREATE INDEX notifications_unsent ON notifications (user_id, created_at) WHERE mailed_at IS NULL AND mail <> 'off'`,
  );
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('notifications');
}
