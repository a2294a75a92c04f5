import { DataTypes, type QueryInterface } from 'sequelize';

// Which castings went into a heat-treatment plan; a casting deleted from the
// heat log leaves the plan.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('heat_treatment_castings', {
    heat_treatment_id: {
      type: DataTypes.UUID,
      primaryKey: true,
      references: { model: 'heat_treatments', key: 'id' },
      onDelete: 'CASCADE',
    },
    casting_id: { type: DataTypes.UUID, primaryKey: true, references: { model: 'castings', key: 'id' }, onDelete: 'CASCADE' },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('heat_treatment_castings', ['casting_id'], { name: 'heat_treatment_castings_casting' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('heat_treatment_castings');
}
