import { DataTypes, type QueryInterface } from 'sequelize';

// A defect marked on a photo: a point or a box in fractions of the image's
// width and height (0..1), so it stays put at any display size.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('marks', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    workshop_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'workshops', key: 'id' }, onDelete: 'CASCADE' },
    photo_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'photos', key: 'id' }, onDelete: 'CASCADE' },
    author_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    defect_kind: { type: DataTypes.STRING(40), allowNull: false },
    severity: { type: DataTypes.SMALLINT, allowNull: false },
    shape: { type: DataTypes.STRING(5), allowNull: false },
    x: { type: DataTypes.DOUBLE, allowNull: false },
    y: { type: DataTypes.DOUBLE, allowNull: false },
    width: { type: DataTypes.DOUBLE, allowNull: true },
    height: { type: DataTypes.DOUBLE, allowNull: true },
    note: { type: DataTypes.TEXT, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.sequelize.query(`
    ALTER TABLE marks
      ADD CONSTRAINT marks_severity CHECK (severity BETWEEN 1 AND 3),
      ADD CONSTRAINT marks_shape CHECK (shape IN ('point', 'box')),
      ADD CONSTRAINT marks_inside CHECK (x BETWEEN 0 AND 1 AND y BETWEEN 0 AND 1),
      ADD CONSTRAINT marks_box CHECK (
        (shape = 'point' AND width IS NULL AND height IS NULL) OR
        (shape = 'box' AND width > 0 AND height > 0 AND x + width <= 1.000001 AND y + height <= 1.000001))`);
  await qi.addIndex('marks', ['photo_id', 'created_at'], { name: 'marks_photo' });
  await qi.addIndex('marks', ['workshop_id', 'defect_kind'], { name: 'marks_workshop_kind' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('marks');
}
