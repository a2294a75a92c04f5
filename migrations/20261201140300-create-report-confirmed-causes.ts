import { DataTypes, type QueryInterface } from 'sequelize';

// The causes a reviewer confirmed when resolving a report: melt variables of
// the trade core, with a note and fixes to try. The workshop's priors count them.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('report_confirmed_causes', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    report_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'reports', key: 'id' }, onDelete: 'CASCADE' },
    variable: { type: DataTypes.STRING(40), allowNull: false },
    note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    fixes_to_try: { type: DataTypes.ARRAY(DataTypes.TEXT), allowNull: false, defaultValue: [] },
    confirmed_by: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('report_confirmed_causes', ['report_id', 'variable'], { unique: true, name: 'report_confirmed_causes_unique' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('report_confirmed_causes');
}
