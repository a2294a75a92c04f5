import type { QueryInterface } from 'sequelize';

// rate-limiter-flexible's PostgreSQL store layout, kept in the database so
// every app server behind a load balancer counts the same attempts.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.query(`
    CREATE TABLE rate_limits (
      key varchar(255) PRIMARY KEY,
      points integer NOT NULL DEFAULT 0,
      expire bigint
    )`);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('rate_limits');
}
