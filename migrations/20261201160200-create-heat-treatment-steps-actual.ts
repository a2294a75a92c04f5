import { DataTypes, type QueryInterface } from 'sequelize';

// What actually happened in each step of a plan, by the step's index in the
// stored plan. temperature_c is the oven reading for solution and ageing and
// the bath temperature for a quench; quench_delay_s is oven door to tank.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('heat_treatment_steps_actual', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    heat_treatment_id: {
      type: DataTypes.UUID,
      allowNull: false,
      references: { model: 'heat_treatments', key: 'id' },
      onDelete: 'CASCADE',
    },
    step_index: { type: DataTypes.SMALLINT, allowNull: false },
    started_at: { type: DataTypes.DATE, allowNull: true },
    ended_at: { type: DataTypes.DATE, allowNull: true },
    temperature_c: { type: DataTypes.DECIMAL, allowNull: true },
    quench_medium: { type: DataTypes.STRING(12), allowNull: true },
    quench_delay_s: { type: DataTypes.DECIMAL, allowNull: true },
    notes: { type: DataTypes.TEXT, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('heat_treatment_steps_actual', ['heat_treatment_id', 'step_index'], {
    unique: true,
    name: 'heat_treatment_steps_actual_step',
  });
  await qi.sequelize.query(`
    ALTER TABLE heat_treatment_steps_actual
      ADD CONSTRAINT heat_treatment_steps_actual_index CHECK (step_index >= 0),
      ADD CONSTRAINT heat_treatment_steps_actual_times CHECK (started_at IS NULL OR ended_at IS NULL OR started_at <= ended_at),
      ADD CONSTRAINT heat_treatment_steps_actual_medium CHECK (quench_medium IS NULL OR quench_medium IN ('water','polymer','air','other')),
      ADD CONSTRAINT heat_treatment_steps_actual_delay CHECK (quench_delay_s IS NULL OR quench_delay_s >= 0)`);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('heat_treatment_steps_actual');
}
