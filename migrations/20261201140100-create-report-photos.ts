import { DataTypes, type QueryInterface } from 'sequelize';

// Which photos of its casting a report concerns; their marks come with them.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('report_photos', {
    report_id: { type: DataTypes.UUID, primaryKey: true, references: { model: 'reports', key: 'id' }, onDelete: 'CASCADE' },
    photo_id: { type: DataTypes.UUID, primaryKey: true, references: { model: 'photos', key: 'id' }, onDelete: 'CASCADE' },
    position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
  });
  await qi.addIndex('report_photos', ['photo_id'], { name: 'report_photos_photo' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('report_photos');
}
