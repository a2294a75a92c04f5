import { DataTypes, type QueryInterface } from 'sequelize';

// Hardness readings after treatment: the scale is kept with each value,
// since HB, HRB, HRE, HV and Webster B numbers do not compare directly.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('heat_treatment_hardness', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    heat_treatment_id: {
      type: DataTypes.UUID,
      allowNull: false,
      references: { model: 'heat_treatments', key: 'id' },
      onDelete: 'CASCADE',
    },
    casting_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'castings', key: 'id' }, onDelete: 'SET NULL' },
    scale: { type: DataTypes.STRING(12), allowNull: false },
    value: { type: DataTypes.DECIMAL, allowNull: false },
    location_note: { type: DataTypes.STRING(200), allowNull: true },
    measured_at: { type: DataTypes.DATE, allowNull: false },
    created_by: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('heat_treatment_hardness', ['heat_treatment_id', 'measured_at'], { name: 'heat_treatment_hardness_plan' });
  await qi.sequelize.query(
    `ALTER TABLE heat_treatment_hardness ADD CONSTRAINT heat_treatment_hardness_scale CHECK (scale IN ('HB','HRB','HRE','HV','webster_b'))`,
  );
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('heat_treatment_hardness');
}
