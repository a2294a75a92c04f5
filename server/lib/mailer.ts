import nodemailer, { type Transporter } from 'nodemailer';
import { config } from '../config.ts';

export type OutgoingMail = { to: string; subject: string; text: string; html: string; messageId?: string };

// One transport per process, pooled; SMTP_URL names a real provider in
// production and the local mail fake in development and tests.
let transport: Transporter | undefined;

function getTransport(): Transporter {
  const url = new URL(config().mail.smtpUrl);
  transport ??= nodemailer.createTransport({
    host: url.hostname,
    port: Number(url.port || (url.protocol === 'smtps:' ? 465 : 587)),
    secure: url.protocol === 'smtps:',
    auth: url.username ? { user: decodeURIComponent(url.username), pass: decodeURIComponent(url.password) } : undefined,
    // A mail server that is down must fail fast, not hold the request.
    connectionTimeout: 5_000,
    greetingTimeout: 5_000,
    socketTimeout: 10_000,
  });
  return transport;
}

export async function sendMail(mail: OutgoingMail): Promise<void> {
  await getTransport().sendMail({ from: config().mail.from, ...mail });
}

export function closeMailer(): void {
  transport?.close();
  transport = undefined;
}

/** Escapes text for the HTML body of a mail. */
export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}

/** A plain, readable HTML mail around one call to action. */
export function mailLayout(opts: { heading: string; paragraphs: string[]; action: { label: string; url: string } }) {
  const body = opts.paragraphs.map((p) => `<p>${escapeHtml(p)}</p>`).join('\n');
  return `<!doctype html><html><body style="font-family:sans-serif;line-height:1.5;color:#26221e">
<h1 style="font-size:20px">${escapeHtml(opts.heading)}</h1>
${body}
<p><a href="${escapeHtml(opts.action.url)}" style="color:#1d5f8a">${escapeHtml(opts.action.label)}</a></p>
<p style="color:#6b635a;font-size:13px">Sent by Pourscope. If you did not expect this message you can ignore it.</p>
</body></html>`;
}
