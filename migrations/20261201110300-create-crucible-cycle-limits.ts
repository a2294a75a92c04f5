import { DataTypes, type QueryInterface } from 'sequelize';

// A workshop's own heat-cycle warning and limit per crucible material. With
// no row the defaults in shared/heats/crucible-life.ts apply.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('crucible_cycle_limits', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    workshop_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'workshops', key: 'id' }, onDelete: 'CASCADE' },
    material: { type: DataTypes.STRING(20), allowNull: false },
    warn_at: { type: DataTypes.INTEGER, allowNull: false },
    limit_at: { type: DataTypes.INTEGER, allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('crucible_cycle_limits', ['workshop_id', 'material'], {
    unique: true,
    name: 'crucible_cycle_limits_workshop_material',
  });
  await qi.sequelize.query(`
    ALTER TABLE crucible_cycle_limits
      ADD CONSTRAINT crucible_cycle_limits_material CHECK (material IN ('clay_graphite','silicon_carbide','steel','ceramic','other')),
      ADD CONSTRAINT crucible_cycle_limits_order CHECK (warn_at >= 1 AND warn_at <= limit_at)`);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('crucible_cycle_limits');
}
