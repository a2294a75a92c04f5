import { DataTypes, type QueryInterface } from 'sequelize';

// A photo of a casting; its three objects (original, display, thumbnail)
// live in the object store under unguessable keys and only the keys and
// dimensions are kept here.
export async function up({ context: qi }: { context: QueryInterface }) {
  const variant = (name: string) => ({
    [`${name}_key`]: { type: DataTypes.STRING(300), allowNull: false, unique: true },
    [`${name}_width`]: { type: DataTypes.INTEGER, allowNull: false },
    [`${name}_height`]: { type: DataTypes.INTEGER, allowNull: false },
    [`${name}_bytes`]: { type: DataTypes.INTEGER, allowNull: false },
  });
  await qi.createTable('photos', {
    id: { type: DataTypes.UUID, primaryKey: true },
    workshop_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'workshops', key: 'id' }, onDelete: 'CASCADE' },
    casting_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'castings', key: 'id' }, onDelete: 'CASCADE' },
    uploaded_by: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    sha256: { type: DataTypes.STRING(64), allowNull: false },
    title: { type: DataTypes.STRING(120), allowNull: true },
    notes: { type: DataTypes.TEXT, allowNull: true },
    file_name: { type: DataTypes.STRING(255), allowNull: true },
    source_format: { type: DataTypes.STRING(8), allowNull: false },
    captured_at: { type: DataTypes.DATE, allowNull: true },
    original_content_type: { type: DataTypes.STRING(20), allowNull: false },
    ...variant('original'),
    ...variant('display'),
    ...variant('thumb'),
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('photos', ['workshop_id', 'sha256'], { unique: true, name: 'photos_workshop_sha256' });
  await qi.addIndex('photos', ['workshop_id', 'created_at', 'id'], { name: 'photos_workshop_created' });
  await qi.addIndex('photos', ['casting_id'], { name: 'photos_casting' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('photos');
}
