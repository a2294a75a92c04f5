import { QueryTypes } from 'sequelize';
import { sequelize } from '../db/sequelize.ts';
import { defineJob, enqueue } from './jobs.ts';
import { sendMail, type OutgoingMail } from './mailer.ts';

const MAIL_JOB = 'send-mail';

/**
 * Sends each queued mail once. pg-boss delivers a job at least once, so the
 * job id is recorded after a successful send and checked before sending: a
 * retry of a job whose mail already went out does nothing.
 */
defineJob<OutgoingMail>(MAIL_JOB, async (mail, job) => {
  const sent = await sequelize.query('SELECT 1 FROM mail_deliveries WHERE job_id = :id', {
    replacements: { id: job.id },
    type: QueryTypes.SELECT,
  });
  if (sent.length) return;
  await sendMail({ ...mail, messageId: `<${job.id}@pourscope>` });
  await sequelize.query('INSERT INTO mail_deliveries (job_id, recipient, subject) VALUES (:id, :to, :subject) ON CONFLICT DO NOTHING', {
    replacements: { id: job.id, to: mail.to, subject: mail.subject.slice(0, 200) },
  });
});

/** Queues a mail; the request that caused it never waits for the mail server. */
export async function queueMail(mail: OutgoingMail): Promise<void> {
  await enqueue(MAIL_JOB, mail);
}
