import { randomUUID } from 'node:crypto';
import { mkdirSync, writeFileSync, renameSync } from 'node:fs';
import path from 'node:path';
import { simpleParser, type AddressObject } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import type { StoredMail } from '../../server/lib/mail-outbox.ts';

/**
 * The local stand-in for an SMTP provider: a real SMTP server on 127.0.0.1
 * that parses every message it receives and keeps it as one JSON file in
 * `directory`. The app's development outbox page and the tests read that same
 * folder (see server/lib/mail-outbox.ts), so mail takes the real protocol path.
 */
export type MailFakeHandle = {
  url: string;
  port: number;
  directory: string;
  /** Closes the server; tests use it to simulate a mail outage. */
  stop: () => Promise<void>;
};

function addresses(value: AddressObject | AddressObject[] | undefined): string[] {
  const list = Array.isArray(value) ? value : value ? [value] : [];
  return list.flatMap((a) => a.value.map((v) => v.address ?? '')).filter(Boolean);
}

export async function startMailFake(opts: { directory: string; port: number }): Promise<MailFakeHandle> {
  mkdirSync(opts.directory, { recursive: true });
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          const mail: StoredMail = {
            id: randomUUID(),
            receivedAt: new Date().toISOString(),
            from: addresses(parsed.from)[0] ?? session.envelope.mailFrom?.toString() ?? '',
            to: addresses(parsed.to),
            subject: parsed.subject ?? '',
            text: parsed.text ?? '',
            html: typeof parsed.html === 'string' ? parsed.html : null,
          };
          // Write then rename so a reader never sees half a message.
          const name = `${Date.now()}-${mail.id}.json`;
          const temp = path.join(opts.directory, `.${name}.tmp`);
          writeFileSync(temp, JSON.stringify(mail));
          renameSync(temp, path.join(opts.directory, name));
          callback();
        })
        .catch((error: Error) => callback(error));
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(opts.port, '127.0.0.1', () => resolve());
  });
  let stopped = false;
  return {
    url: `smtp://127.0.0.1:${opts.port}`,
    port: opts.port,
    directory: opts.directory,
    stop: () =>
      new Promise<void>((resolve) => {
        if (stopped) return resolve();
        stopped = true;
        server.close(() => resolve());
      }),
  };
}

