import { DataTypes, type QueryInterface } from 'sequelize';

// A heat-treatment plan for one caster's castings: the trade core's schedule
// for the alloy and temper, frozen in `plan` when the plan is made so a later
// change to the library never rewrites what the oven was told to do.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('heat_treatments', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    workshop_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'workshops', key: 'id' }, onDelete: 'CASCADE' },
    // Whose castings these are; who may read and record follows from it, as for their heats.
    caster_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    created_by: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    alloy: { type: DataTypes.STRING(60), allowNull: false },
    temper: { type: DataTypes.STRING(8), allowNull: false },
    plan: { type: DataTypes.JSONB, allowNull: false },
    oven: { type: DataTypes.STRING(80), allowNull: false },
    state: { type: DataTypes.STRING(12), allowNull: false, defaultValue: 'planned' },
    notes: { type: DataTypes.TEXT, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('heat_treatments', ['workshop_id', 'caster_id', 'created_at'], { name: 'heat_treatments_workshop_caster' });
  await qi.sequelize.query(`
    ALTER TABLE heat_treatments
      ADD CONSTRAINT heat_treatments_state CHECK (state IN ('planned','in_progress','done')),
      ADD CONSTRAINT heat_treatments_temper CHECK (temper IN ('F','T4','T5','T51','T6','T61','T7','T71'))`);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('heat_treatments');
}
