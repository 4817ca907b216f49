import type { AddressInfo } from 'node:net';
import { simpleParser, type AddressObject } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import type { JobRunner } from '../../jobs/job-runner';
import { closeMailTransports, type MailTarget } from './mail-job';
import type { MailRepository } from './mail.repository';

/** What another module hands to ctx.services.get('mail').send. */
export interface OutgoingMail {
  studioId: number;
  to: string;
  subject: string;
  text: string;
  attachments?: { filename: string; content: Buffer; contentType?: string }[];
}

/** ctx.services key 'mail': sends a message and records it in the studio's outbox. */
export interface MailService {
  send(mail: OutgoingMail): Promise<{ id: number; messageId: string }>;
  /** Start the local SMTP server (development, demo, tests) on `port`; 0 picks a free one. */
  startLocal(port: number): Promise<number>;
  close(): Promise<void>;
}

/** Header the local SMTP server reads to file a message under its studio. */
const STUDIO_HEADER = 'x-seamrun-studio';
const addressText = (a: AddressObject | AddressObject[] | undefined) =>
  (Array.isArray(a) ? a : a ? [a] : []).map((x) => x.text).join(', ');

/**
 * Mail through nodemailer. With SMTP_URL it relays to that server and records each message itself; without
 * it, a local SMTP server (smtp-server, 127.0.0.1 only) receives every message, parses it with mailparser
 * and stores it in the outbox, so development, the demo and tests never reach anyone's inbox.
 */
export function createMailService(repo: MailRepository, opts: { smtpUrl?: string; from: string; jobs: JobRunner }): MailService {
  let server: SMTPServer | null = null;
  let port: number | null = null;
  let starting: Promise<number> | null = null;

  function startLocal(wanted: number): Promise<number> {
    if (starting) return starting;
    const smtp = new SMTPServer({
      authOptional: true,
      disabledCommands: ['STARTTLS', 'AUTH'],
      banner: 'Seamrun local outbox',
      size: 25 * 1024 * 1024,
      onData(stream, _session, callback) {
        simpleParser(stream)
          .then(async (parsed) => {
            const studioId = Number(parsed.headers.get(STUDIO_HEADER));
            if (!Number.isInteger(studioId) || studioId <= 0) throw new Error('No studio header');
            await repo.insert({
              studioId,
              to: addressText(parsed.to).slice(0, 200),
              subject: (parsed.subject ?? '').slice(0, 300),
              text: parsed.text ?? '',
              attachments: parsed.attachments.map((a) => ({ filename: a.filename ?? 'attachment', size: a.size })),
              messageId: (parsed.messageId ?? '').slice(0, 200),
              status: 'sent',
            });
            callback();
          })
          .catch((e: Error) => callback(e));
      },
    });
    starting = new Promise<number>((resolve, reject) => {
      smtp.on('error', reject);
      smtp.listen(wanted, '127.0.0.1', () => {
        const address = smtp.server.address() as AddressInfo;
        port = address.port;
        server = smtp;
        resolve(port);
      });
    });
    return starting;
  }

  /** Where messages go: SMTP_URL, or the local outbox server (started on first use when not yet). */
  async function target(): Promise<MailTarget> {
    if (opts.smtpUrl) return { url: opts.smtpUrl };
    if (!starting) {
      await startLocal(0);
      // Started lazily (tests, createApp without start): never keep the process alive for it.
      server?.server.unref();
    }
    return { host: '127.0.0.1', port: await starting! };
  }

  async function send(mail: OutgoingMail) {
    // Handing the message over is a job: in this process, or on a job worker with REDIS_URL.
    const { messageId } = await opts.jobs.run('mail', {
      target: await target(),
      from: opts.from,
      to: mail.to,
      subject: mail.subject,
      text: mail.text,
      attachments: mail.attachments,
      headers: { [STUDIO_HEADER]: String(mail.studioId) },
    });
    if (!opts.smtpUrl) {
      const stored = await repo.byMessageId(messageId);
      if (stored) return { id: stored.id, messageId };
    }
    const row = await repo.insert({
      studioId: mail.studioId,
      to: mail.to,
      subject: mail.subject,
      text: mail.text,
      attachments: (mail.attachments ?? []).map((a) => ({ filename: a.filename, size: a.content.length })),
      messageId,
      status: 'sent',
    });
    return { id: row.id, messageId };
  }

  async function close() {
    closeMailTransports();
    const s = server;
    server = null;
    starting = null;
    if (s) await new Promise<void>((r) => s.close(() => r()));
  }

  return { send, startLocal, close };
}
