import type { ApiModule, ModuleContext } from '../module';
import { createMailRepository } from './mail.repository';
import { mailRoutes } from './mail.routes';
import { createMailService, type MailService } from './mail.service';

const running = new Set<MailService>();

/**
 * The mail area. Registers ctx.services 'mail' ({@link MailService}: send({ studioId, to, subject, text,
 * attachments })). start() opens the local SMTP server on LOCAL_SMTP_PORT unless SMTP_URL is set; under
 * createApp alone (tests) it starts lazily on a free port at the first send.
 */
export const mailModule: ApiModule = {
  name: 'mail',
  register(api, ctx) {
    const repo = createMailRepository(ctx.ds);
    const service = createMailService(repo, { smtpUrl: ctx.env.SMTP_URL || undefined, from: ctx.env.MAIL_FROM ?? 'Seamrun <no-reply@seamrun.local>', jobs: ctx.jobs });
    ctx.services.set('mail', service);
    api.use('/mail', mailRoutes(repo, service, ctx));
  },
  async start(ctx: ModuleContext) {
    if (ctx.env.SMTP_URL) return;
    const service = ctx.services.get('mail') as MailService;
    await service.startLocal(ctx.env.LOCAL_SMTP_PORT ?? 0);
    running.add(service);
  },
  async stop() {
    for (const s of running) await s.close();
    running.clear();
  },
};
