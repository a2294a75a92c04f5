import { readStoredMail, type StoredMail } from '../../server/lib/mail-outbox.ts';

/** Waits for a message to `to` in the mail fake's store that matches. */
export async function waitForMail(
  to: string,
  match: (m: StoredMail) => boolean = () => true,
  timeoutMs = 8_000,
): Promise<StoredMail> {
  const dir = process.env.MAIL_FAKE_DIR!;
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const found = readStoredMail(dir).find((m) => m.to.includes(to) && match(m));
    if (found) return found;
    if (Date.now() > deadline) throw new Error(`no mail to ${to} arrived within ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

export function mailsTo(to: string): StoredMail[] {
  return readStoredMail(process.env.MAIL_FAKE_DIR!).filter((m) => m.to.includes(to));
}

/** The first link in a mail's plain-text body that starts with `prefix`. */
export function linkIn(mail: StoredMail, prefix: string): string {
  const url = mail.text.match(/https?:\/\/\S+/g)?.find((u) => new URL(u).pathname.startsWith(prefix));
  if (!url) throw new Error(`no ${prefix} link in mail "${mail.subject}"`);
  return url;
}

/** The proxy in front of the mail fake, started by tests/setup/api-setup.ts. */
export function mailProxy(): import('./tcp-proxy.ts').TcpProxy {
  return (globalThis as { mailProxy?: import('./tcp-proxy.ts').TcpProxy }).mailProxy!;
}
