import { DataTypes, type QueryInterface } from 'sequelize';

// A report's history: every change of state (and the creation, edits of a
// draft and follow-up links), who made it, when, and their note.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('report_events', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    report_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'reports', key: 'id' }, onDelete: 'CASCADE' },
    actor_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    action: { type: DataTypes.STRING(20), allowNull: false },
    from_state: { type: DataTypes.STRING(10), allowNull: true },
    to_state: { type: DataTypes.STRING(10), allowNull: false },
    note: { type: DataTypes.TEXT, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('report_events', ['report_id', 'created_at'], { name: 'report_events_report' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('report_events');
}
