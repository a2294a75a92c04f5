import { DataTypes, type QueryInterface } from 'sequelize';

// A workshop's moulds. The cavity's capacity is grams of a named alloy, so a
// charge can be planned for another alloy by density.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('moulds', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    workshop_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'workshops', key: 'id' }, onDelete: 'CASCADE' },
    name: { type: DataTypes.STRING(80), allowNull: false },
    material: { type: DataTypes.STRING(20), allowNull: false },
    capacity_g: { type: DataTypes.DECIMAL, allowNull: true },
    capacity_alloy: { type: DataTypes.STRING(60), allowNull: true },
    has_riser: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    coating: { type: DataTypes.STRING(200), allowNull: true },
    notes: { type: DataTypes.TEXT, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('moulds', ['workshop_id', 'name'], { name: 'moulds_workshop_name' });
  await qi.sequelize.query(`
    ALTER TABLE moulds
      ADD CONSTRAINT moulds_material CHECK (material IN ('graphite','steel','cast_iron','green_sand','bonded_sand','investment','plaster')),
      ADD CONSTRAINT moulds_capacity CHECK (capacity_g IS NULL OR capacity_g > 0)`);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('moulds');
}
