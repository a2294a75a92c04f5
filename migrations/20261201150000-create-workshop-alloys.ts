import { DataTypes, type QueryInterface } from 'sequelize';

// A workshop's own alloys ("wheel scrap, assumed A356"), beside the library's.
// `data` is the whole alloy as the trade core's alloySchema parses it; the
// designation and its folded key sit in columns so a workshop cannot hold the
// same alloy twice ("A356 scrap" = "a356-scrap").
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('workshop_alloys', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    workshop_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'workshops', key: 'id' }, onDelete: 'CASCADE' },
    designation: { type: DataTypes.STRING(60), allowNull: false },
    designation_key: { type: DataTypes.STRING(60), allowNull: false },
    data: { type: DataTypes.JSONB, allowNull: false },
    source_note: { type: DataTypes.STRING(400), allowNull: false },
    created_by: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('workshop_alloys', ['workshop_id', 'designation_key'], {
    name: 'workshop_alloys_workshop_designation',
    unique: true,
  });
  await qi.sequelize.query(
    `ALTER TABLE workshop_alloys ADD CONSTRAINT workshop_alloys_data_object CHECK (jsonb_typeof(data) = 'object')`,
  );
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('workshop_alloys');
}
