import type { ApiModule, ModuleContext } from '../module';
import { createMailRepository } from './mail.repository';
import { mailRoutes } from './mail.routes';
import { createMailService } from './mail.service';

/**
 * The mail area. Its service (MailService: send({ studioId, to, subject, text, attachments })) is how
 * other areas send. start() opens the local SMTP server on LOCAL_SMTP_PORT unless SMTP_URL is set; under
 * createApp alone (tests) it starts lazily on a free port at the first send.
 */
export function createMailModule(ctx: ModuleContext) {
  const repo = createMailRepository(ctx.ds);
  const mail = createMailService(repo, { smtpUrl: ctx.env.SMTP_URL || undefined, from: ctx.env.MAIL_FROM ?? 'Seamrun <no-reply@seamrun.local>', jobs: ctx.jobs });
  let started = false;
  return {
    name: 'mail',
    services: { mail },
    mount(api) {
      api.use('/mail', mailRoutes(repo, mail, ctx));
    },
    async start() {
      if (ctx.env.SMTP_URL) return;
      await mail.startLocal(ctx.env.LOCAL_SMTP_PORT ?? 0);
      started = true;
    },
    async stop() {
      if (started) await mail.close();
      started = false;
    },
  } satisfies ApiModule & { services: unknown };
}
