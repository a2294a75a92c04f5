import { DataTypes, type QueryInterface } from 'sequelize';

// Dated condition notes on a crucible ("hairline crack at the rim"); an
// append-only record, so a note keeps its day and author.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('crucible_notes', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    crucible_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'crucibles', key: 'id' }, onDelete: 'CASCADE' },
    noted_on: { type: DataTypes.DATEONLY, allowNull: false },
    note: { type: DataTypes.TEXT, allowNull: false },
    author_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('crucible_notes', ['crucible_id', 'noted_on'], { name: 'crucible_notes_crucible' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('crucible_notes');
}
