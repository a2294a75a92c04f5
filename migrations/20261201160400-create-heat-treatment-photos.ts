import { DataTypes, type QueryInterface } from 'sequelize';

// Photos of the treated castings that belong with the outcome (blisters,
// distortion, the etched section); the photo itself stays in the gallery.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('heat_treatment_photos', {
    heat_treatment_id: {
      type: DataTypes.UUID,
      primaryKey: true,
      references: { model: 'heat_treatments', key: 'id' },
      onDelete: 'CASCADE',
    },
    photo_id: { type: DataTypes.UUID, primaryKey: true, references: { model: 'photos', key: 'id' }, onDelete: 'CASCADE' },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('heat_treatment_photos', ['photo_id'], { name: 'heat_treatment_photos_photo' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('heat_treatment_photos');
}
