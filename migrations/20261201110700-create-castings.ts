import { DataTypes, type QueryInterface } from 'sequelize';

// One pour from a heat into a mould. Photos of castings reference this table.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('castings', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    workshop_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'workshops', key: 'id' }, onDelete: 'CASCADE' },
    heat_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'heats', key: 'id' }, onDelete: 'CASCADE' },
    position: { type: DataTypes.INTEGER, allowNull: false },
    mould_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'moulds', key: 'id' }, onDelete: 'SET NULL' },
    mould_preheat_c: { type: DataTypes.DECIMAL, allowNull: true },
    coated: { type: DataTypes.BOOLEAN, allowNull: true },
    vented: { type: DataTypes.BOOLEAN, allowNull: true },
    pour_height_cm: { type: DataTypes.DECIMAL, allowNull: true },
    section_thickness_mm: { type: DataTypes.DECIMAL, allowNull: true },
    mass_g: { type: DataTypes.DECIMAL, allowNull: true },
    air_cool_min: { type: DataTypes.DECIMAL, allowNull: true },
    quench_medium: { type: DataTypes.STRING(8), allowNull: false, defaultValue: 'none' },
    notes: { type: DataTypes.TEXT, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('castings', ['heat_id', 'position'], { name: 'castings_heat_position' });
  await qi.addIndex('castings', ['mould_id'], { name: 'castings_mould' });
  await qi.addIndex('castings', ['workshop_id'], { name: 'castings_workshop' });
  await qi.sequelize.query(`
    ALTER TABLE castings
      ADD CONSTRAINT castings_quench_medium CHECK (quench_medium IN ('none','water','other')),
      ADD CONSTRAINT castings_mass CHECK (mass_g IS NULL OR mass_g > 0)`);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('castings');
}
