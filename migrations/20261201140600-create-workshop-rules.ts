import { DataTypes, type QueryInterface } from 'sequelize';

// A workshop's changes to the diagnosis rules: an override (enabled, weight)
// of a shipped rule, or a whole rule of its own as the trade core's JSON.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('workshop_rules', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    workshop_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'workshops', key: 'id' }, onDelete: 'CASCADE' },
    rule_id: { type: DataTypes.STRING(80), allowNull: false },
    origin: { type: DataTypes.STRING(8), allowNull: false },
    rule: { type: DataTypes.JSONB, allowNull: true },
    enabled: { type: DataTypes.BOOLEAN, allowNull: true },
    weight: { type: DataTypes.DOUBLE, allowNull: true },
    created_by: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.sequelize.query(`
    ALTER TABLE workshop_rules
      ADD CONSTRAINT workshop_rules_origin CHECK (origin IN ('default','workshop')),
      ADD CONSTRAINT workshop_rules_rule CHECK ((origin = 'workshop') = (rule IS NOT NULL)),
      ADD CONSTRAINT workshop_rules_weight CHECK (weight IS NULL OR weight BETWEEN 0 AND 1)`);
  await qi.addIndex('workshop_rules', ['workshop_id', 'rule_id'], { unique: true, name: 'workshop_rules_unique' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('workshop_rules');
}
