import { DataTypes, type QueryInterface } from 'sequelize';

// Comments on a report, threaded by parent, optionally pinned to one mark.
// The raw text is stored; HTML is rendered on read so renderer fixes apply
// to old comments too.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('comments', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    workshop_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'workshops', key: 'id' }, onDelete: 'CASCADE' },
    report_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'reports', key: 'id' }, onDelete: 'CASCADE' },
    // Replies outlive a removed parent; they move up to the top level.
    parent_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'comments', key: 'id' }, onDelete: 'SET NULL' },
    author_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    body: { type: DataTypes.TEXT, allowNull: false },
    mark_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'marks', key: 'id' }, onDelete: 'SET NULL' },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
    edited_at: { type: DataTypes.DATE, allowNull: true },
  });
  await qi.addIndex('comments', ['report_id', 'created_at'], { name: 'comments_report' });
  await qi.addIndex('comments', ['mark_id'], { name: 'comments_mark' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('comments');
}
