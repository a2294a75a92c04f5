import { DataTypes, type QueryInterface } from 'sequelize';

// A workshop's crucibles. Their heat-cycle count is not stored: it is the
// number of heats that name the crucible.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('crucibles', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    workshop_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'workshops', key: 'id' }, onDelete: 'CASCADE' },
    name: { type: DataTypes.STRING(80), allowNull: false },
    material: { type: DataTypes.STRING(20), allowNull: false },
    capacity_g: { type: DataTypes.DECIMAL, allowNull: true },
    in_service_since: { type: DataTypes.DATEONLY, allowNull: true },
    retired: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    retired_on: { type: DataTypes.DATEONLY, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('crucibles', ['workshop_id', 'name'], { name: 'crucibles_workshop_name' });
  await qi.sequelize.query(`
    ALTER TABLE crucibles
      ADD CONSTRAINT crucibles_material CHECK (material IN ('clay_graphite','silicon_carbide','steel','ceramic','other')),
      ADD CONSTRAINT crucibles_capacity CHECK (capacity_g IS NULL OR capacity_g > 0),
      ADD CONSTRAINT crucibles_retired_on CHECK (retired OR retired_on IS NULL)`);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('crucibles');
}
