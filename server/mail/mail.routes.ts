import type { MailMessage as MailView, MailSummary } from '@shared/api/types';
import { notFound } from '../http/api-error';
import type { RouteDef } from '../http/route';
import { MailMessage } from './mail-message.entity';

const OUTBOX_PAGE = 200;

const summary = (m: MailMessage): MailSummary => ({
  id: m.id,
  to: m.toAddress,
  subject: m.subject,
  createdAt: m.createdAt.toISOString(),
});

export const mailRoutes: RouteDef[] = [
  {
    method: 'get',
    path: '/api/mail',
    summary: 'Mail the shop sent that the local mail fake captured, newest first.',
    roles: ['owner'],
    async handler(req, res, ctx) {
      const messages = await ctx.ds.getRepository(MailMessage).find({
        where: { shopId: req.member.shopId },
        order: { createdAt: 'DESC' },
        take: OUTBOX_PAGE,
      });
      res.json({ messages: messages.map(summary), capturing: !ctx.config.smtpUrl });
    },
  },
  {
    method: 'get',
    path: '/api/mail/:id',
    summary: 'One captured message with its text.',
    roles: ['owner'],
    async handler(req, res, ctx) {
      const m = await ctx.ds.getRepository(MailMessage).findOneBy({ id: String(req.params.id), shopId: req.member.shopId });
      if (!m) throw notFound('message');
      const message: MailView = { ...summary(m), from: m.fromAddress, text: m.text, html: m.html, attachments: m.attachments };
      res.json({ message });
    },
  },
];
