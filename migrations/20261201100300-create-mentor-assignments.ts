import { DataTypes, type QueryInterface } from 'sequelize';

// Which mentors review which students, per workshop.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('mentor_assignments', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    workshop_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'workshops', key: 'id' }, onDelete: 'CASCADE' },
    mentor_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    student_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('mentor_assignments', ['workshop_id', 'mentor_id', 'student_id'], {
    unique: true,
    name: 'mentor_assignments_unique',
  });
  await qi.addIndex('mentor_assignments', ['workshop_id', 'student_id'], { name: 'mentor_assignments_student' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('mentor_assignments');
}
