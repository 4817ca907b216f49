import { Router } from 'express';
import { idParam } from '../../../shared/schemas/common';
import { inviteInput, inviteParams, type MailMessageDto } from '../../../shared/schemas/mail';
import type { MailMessageEntity } from '../../entities';
import { actorOf, requirePermission } from '../../auth/require';
import { notFound } from '../../errors';
import { validate } from '../../middleware/validate';
import type { RouteContext } from '../module';
import type { MailRepository } from './mail.repository';
import type { MailService } from './mail.service';

export const presentMail = (m: MailMessageEntity): MailMessageDto => ({
  id: m.id,
  to: m.to,
  subject: m.subject,
  text: m.text,
  attachments: m.attachments,
  messageId: m.messageId,
  status: m.status,
  createdAt: new Date(m.createdAt).toISOString(),
});

/** /api/mail: the outbox (suppliers:manage) and staff invitations (people:manage). */
export function mailRoutes(repo: MailRepository, mail: MailService, ctx: RouteContext) {
  const r = Router();
  r.get('/outbox', requirePermission('suppliers:manage'), async (req, res) => {
    res.json({ messages: (await repo.list(actorOf(req).studioId)).map(presentMail) });
  });
  r.get('/outbox/:id', requirePermission('suppliers:manage'), validate({ params: idParam }), async (req, res) => {
    const m = await repo.get(actorOf(req).studioId, Number(req.params.id));
    if (!m) throw notFound('Message');
    res.json({ message: presentMail(m) });
  });
  r.post('/invite/:userId', requirePermission('people:manage'), validate({ params: inviteParams, body: inviteInput }), async (req, res) => {
    const actor = actorOf(req);
    const user = await repo.user(actor.studioId, Number(req.params.userId));
    if (!user) throw notFound('Person');
    const studio = await repo.studio(actor.studioId);
    const signIn = `${req.protocol}://${req.get('host')}/signin`;
    const lines = [
      `Hello ${user.name},`,
      '',
      `${actor.name} has added you to ${studio.name} on Seamrun.`,
      `Sign in at ${signIn} with this e-mail address (${user.email}).`,
      'Use the temporary password the owner gives you in person; you will be asked to choose your own.',
      ...(req.body.note ? ['', req.body.note] : []),
      '',
      `— ${studio.name}`,
    ];
    const sent = await mail.send({ studioId: actor.studioId, to: user.email, subject: `Your Seamrun sign-in for ${studio.name}`, text: lines.join('\n') });
    await ctx.audit.record(actor, 'invite', 'user', user.id, undefined, { to: user.email, messageId: sent.messageId });
    const m = await repo.get(actor.studioId, sent.id);
    res.status(201).json({ message: m ? presentMail(m) : null });
  });
  return r;
}
