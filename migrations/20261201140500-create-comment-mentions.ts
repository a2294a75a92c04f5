import { DataTypes, type QueryInterface } from 'sequelize';

// Members @mentioned in a comment; each is notified once.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('comment_mentions', {
    comment_id: { type: DataTypes.UUID, primaryKey: true, references: { model: 'comments', key: 'id' }, onDelete: 'CASCADE' },
    user_id: { type: DataTypes.UUID, primaryKey: true, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
  });
  await qi.addIndex('comment_mentions', ['user_id'], { name: 'comment_mentions_user' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('comment_mentions');
}
