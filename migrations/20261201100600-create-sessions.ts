import type { QueryInterface } from 'sequelize';

// The table connect-pg-simple expects (its table.sql), plus a user_id column
// we fill so sign-out-everywhere and password changes can end a user's other
// sessions.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.query(`
    CREATE TABLE sessions (
      sid varchar NOT NULL PRIMARY KEY,
      sess json NOT NULL,
      expire timestamp(6) NOT NULL,
      user_id uuid GENERATED ALWAYS AS (((sess ->> 'userId'))::uuid) STORED
    )`);
  await qi.sequelize.query('CREATE INDEX sessions_expire ON sessions (expire)');
  await qi.sequelize.query('CREATE INDEX sessions_user ON sessions (user_id)');
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('sessions');
}
