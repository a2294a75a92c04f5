import { DataTypes, type QueryInterface } from 'sequelize';

// A defect report: a caster's question about one casting. The diagnosis at
// submit time is kept whole in `snapshot` (with the rule set's hash) so later
// rule changes never rewrite what the mentor was shown.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('reports', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    workshop_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'workshops', key: 'id' }, onDelete: 'CASCADE' },
    // A report is about its casting: deleting the casting (or its heat) deletes the question too.
    casting_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'castings', key: 'id' }, onDelete: 'CASCADE' },
    author_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    title: { type: DataTypes.STRING(120), allowNull: false },
    question: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    state: { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'draft' },
    snapshot: { type: DataTypes.JSONB, allowNull: true },
    requested_mentor_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    follow_up_heat_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'heats', key: 'id' }, onDelete: 'SET NULL' },
    resolution_note: { type: DataTypes.TEXT, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
    submitted_at: { type: DataTypes.DATE, allowNull: true },
    resolved_at: { type: DataTypes.DATE, allowNull: true },
  });
  await qi.sequelize.query(`
    ALTER TABLE reports
      ADD CONSTRAINT reports_state CHECK (state IN ('draft','submitted','in_review','resolved')),
      ADD CONSTRAINT reports_snapshot CHECK (state = 'draft' OR snapshot IS NOT NULL)`);
  await qi.addIndex('reports', ['workshop_id', 'created_at', 'id'], { name: 'reports_workshop_created' });
  await qi.addIndex('reports', ['workshop_id', 'state', 'submitted_at'], { name: 'reports_workshop_state' });
  await qi.addIndex('reports', ['workshop_id', 'author_id'], { name: 'reports_workshop_author' });
  await qi.addIndex('reports', ['requested_mentor_id'], { name: 'reports_requested_mentor' });
  await qi.addIndex('reports', ['casting_id'], { name: 'reports_casting' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('reports');
}
