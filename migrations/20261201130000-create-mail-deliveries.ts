import type { QueryInterface } from 'sequelize';

// Which queued mails went out, by job id, so a retried job never sends twice.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.query(`
    CREATE TABLE mail_deliveries (
      job_id uuid PRIMARY KEY,
      recipient varchar(254) NOT NULL,
      subject varchar(200) NOT NULL,
      sent_at timestamptz NOT NULL DEFAULT now()
    )`);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('mail_deliveries');
}
