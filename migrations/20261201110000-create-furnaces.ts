import { DataTypes, type QueryInterface } from 'sequelize';

// A workshop's furnaces; its heats teach each one's setpoint offset.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('furnaces', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    workshop_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'workshops', key: 'id' }, onDelete: 'CASCADE' },
    name: { type: DataTypes.STRING(80), allowNull: false },
    kind: { type: DataTypes.STRING(12), allowNull: false },
    notes: { type: DataTypes.TEXT, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('furnaces', ['workshop_id', 'name'], { name: 'furnaces_workshop_name' });
  await qi.sequelize.query(
    `ALTER TABLE furnaces ADD CONSTRAINT furnaces_kind CHECK (kind IN ('electric','gas','induction','other'))`,
  );
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('furnaces');
}
