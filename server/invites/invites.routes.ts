import { IsNull, MoreThan } from 'typeorm';
import type { CreateInviteResponse, Invite as InviteView, InvitePreview } from '@shared/api/types';
import { acceptInviteSchema, createInviteSchema } from '@shared/auth/schemas';
import type { AcceptInviteInput, CreateInviteInput } from '@shared/auth/schemas';
import type { Role } from '@shared/auth/roles';
import { hashPassword } from '../auth/passwords';
import { hashSecretToken, newSecretToken } from '../auth/secret-token';
import { issueSession } from '../auth/session-token';
import { ApiError, notFound } from '../http/api-error';
import type { RouteDef } from '../http/route';
import { inviteMail } from '../mail/templates';
import { Shop } from '../shops/shop.entity';
import { User } from '../users/user.entity';
import { Invite } from './invite.entity';

const INVITE_TTL_MS = 7 * 24 * 60 * 60 * 1000;
const TOKEN_QUERY = /^[A-Za-z0-9_-]{20,100}$/;

const toView = (i: Invite & { invitedBy: User }): InviteView => ({
  id: i.id,
  email: i.email,
  role: i.role,
  invitedBy: i.invitedBy.name,
  expiresAt: i.expiresAt.toISOString(),
  createdAt: i.createdAt.toISOString(),
});

const usable = (tokenHash: string) => ({
  tokenHash,
  acceptedAt: IsNull(),
  revokedAt: IsNull(),
  expiresAt: MoreThan(new Date()),
});

const invalidInvite = () => new ApiError(410, 'invite_invalid', 'This invite has expired, was revoked or was already used. Ask the shop owner for a new one.');

export const inviteRoutes: RouteDef[] = [
  {
    method: 'get',
    path: '/api/invites',
    summary: 'Pending invites of the shop.',
    roles: ['owner'],
    async handler(req, res, ctx) {
      const invites = await ctx.ds.getRepository(Invite).find({
        where: { shopId: req.member.shopId, acceptedAt: IsNull(), revokedAt: IsNull(), expiresAt: MoreThan(new Date()) },
        relations: { invitedBy: true },
        order: { createdAt: 'DESC' },
      });
      res.json({ invites: invites.map(toView) });
    },
  },
  {
    method: 'post',
    path: '/api/invites',
    summary: 'Invite a person by e-mail with a role; mails them a single-use link.',
    roles: ['owner'],
    limited: true,
    body: createInviteSchema,
    async handler(req, res, ctx) {
      const { email, role } = req.body as CreateInviteInput;
      const shopId = req.member.shopId;
      if (await ctx.ds.getRepository(User).existsBy({ email })) {
        throw new ApiError(409, 'already_member', 'That e-mail address already has a Probepath account.', { email: 'Already has an account.' });
      }
      const { token, hash } = newSecretToken();
      const expiresAt = new Date(Date.now() + INVITE_TTL_MS);
      const invite = await ctx.write(async (tx) => {
        // A new invite to the same address replaces any pending one.
        await tx.getRepository(Invite).update({ shopId, email, acceptedAt: IsNull(), revokedAt: IsNull() }, { revokedAt: new Date() });
        return tx.getRepository(Invite).save({ shopId, email, role: role as Role, tokenHash: hash, invitedById: req.member.id, expiresAt, acceptedAt: null, revokedAt: null });
      });
      const link = `${ctx.publicUrl()}/invite?token=${token}`;
      let mailSent = true;
      try {
        await ctx.mailer.send({
          shopId,
          to: email,
          ...inviteMail({ shopName: req.member.shop.name, inviter: req.member.name, role: role as Role, link, expiresAt }),
        });
      } catch (err) {
        mailSent = false;
        req.log.error({ err }, 'invite mail not sent');
      }
      const body: CreateInviteResponse = { invite: toView({ ...invite, invitedBy: req.member }), mailSent };
      res.status(201).json(body);
    },
  },
  {
    method: 'delete',
    path: '/api/invites/:id',
    summary: 'Revoke a pending invite; its link stops working.',
    roles: ['owner'],
    async handler(req, res, ctx) {
      const result = await ctx.write((tx) =>
        tx.getRepository(Invite).update({ id: String(req.params.id), shopId: req.member.shopId, acceptedAt: IsNull(), revokedAt: IsNull() }, { revokedAt: new Date() }),
      );
      if (!result.affected) throw notFound('pending invite');
      res.status(204).end();
    },
  },
  {
    method: 'get',
    path: '/api/invites/preview',
    summary: 'Who an invite link is for (public: the link is the credential).',
    roles: 'public',
    limited: true,
    async handler(req, res, ctx) {
      const token = String(req.query.token ?? '');
      if (!TOKEN_QUERY.test(token)) throw new ApiError(400, 'invalid_token', 'The invite link is incomplete. Open it again from the e-mail.');
      const invite = await ctx.ds.getRepository(Invite).findOne({ where: usable(hashSecretToken(token)), relations: { shop: true } });
      if (!invite) throw invalidInvite();
      const preview: InvitePreview = { email: invite.email, role: invite.role, shopName: invite.shop.name };
      res.json(preview);
    },
  },
  {
    method: 'post',
    path: '/api/invites/accept',
    summary: 'Join the shop from an invite link: set name and password; returns a session.',
    roles: 'public',
    limited: true,
    body: acceptInviteSchema,
    async handler(req, res, ctx) {
      const { token, name, password } = req.body as AcceptInviteInput;
      const passwordHash = await hashPassword(password);
      const user = await ctx.write(async (tx) => {
        const invite = await tx.getRepository(Invite).findOne({ where: usable(hashSecretToken(token)) });
        if (!invite) throw invalidInvite();
        if (await tx.getRepository(User).existsBy({ email: invite.email })) {
          throw new ApiError(409, 'already_member', 'That e-mail address already has a Probepath account. Sign in instead.');
        }
        await tx.getRepository(Invite).update({ id: invite.id }, { acceptedAt: new Date() });
        const saved = await tx.getRepository(User).save({ shopId: invite.shopId, email: invite.email, name, role: invite.role, active: true, passwordHash, sessionEpoch: 0 });
        const shop = await tx.getRepository(Shop).findOneByOrFail({ id: invite.shopId });
        return Object.assign(saved, { shop });
      });
      res.json(issueSession(ctx, user));
    },
  },
];
