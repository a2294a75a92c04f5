import { DataTypes, type QueryInterface } from 'sequelize';

// What went into the crucible for one heat, line by line, in the order given.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('heat_charge_lines', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    heat_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'heats', key: 'id' }, onDelete: 'CASCADE' },
    position: { type: DataTypes.INTEGER, allowNull: false },
    kind: { type: DataTypes.STRING(12), allowNull: false },
    description: { type: DataTypes.STRING(200), allowNull: true },
    mass_g: { type: DataTypes.DECIMAL, allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('heat_charge_lines', ['heat_id', 'position'], { unique: true, name: 'heat_charge_lines_heat_position' });
  await qi.sequelize.query(`
    ALTER TABLE heat_charge_lines
      ADD CONSTRAINT heat_charge_lines_kind CHECK (kind IN ('ingot','clean_scrap','dirty_scrap')),
      ADD CONSTRAINT heat_charge_lines_mass CHECK (mass_g > 0)`);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('heat_charge_lines');
}
