import nodemailer, { type Transporter } from 'nodemailer';

/** Where a message is handed over: SMTP_URL, or the local outbox server of the web process. */
export type MailTarget = { url: string } | { host: string; port: number };

export interface MailJobInput {
  target: MailTarget;
  from: string;
  to: string;
  subject: string;
  text: string;
  attachments?: { filename: string; content: Buffer; contentType?: string }[];
  headers: Record<string, string>;
}

const transports = new Map<string, Transporter>();

/** Send one message with nodemailer (a job: it runs in the web process or on a job worker). */
export async function sendMailJob(input: MailJobInput): Promise<{ messageId: string }> {
  const key = JSON.stringify(input.target);
  let t = transports.get(key);
  if (!t) {
    t = 'url' in input.target
      ? nodemailer.createTransport(input.target.url)
      : nodemailer.createTransport({ host: input.target.host, port: input.target.port, secure: false, ignoreTLS: true });
    transports.set(key, t);
  }
  const info = await t.sendMail({ from: input.from, to: input.to, subject: input.subject, text: input.text, attachments: input.attachments, headers: input.headers });
  return { messageId: String(info.messageId ?? '') };
}

/** Close every transport a process opened (server stop, worker stop). */
export function closeMailTransports() {
  for (const t of transports.values()) t.close();
  transports.clear();
}
