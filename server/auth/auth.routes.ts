import { IsNull, MoreThan } from 'typeorm';
import { forgotPasswordSchema, resetPasswordSchema, signInSchema } from '@shared/auth/schemas';
import type { ForgotPasswordInput, ResetPasswordInput, SignInInput } from '@shared/auth/schemas';
import { ApiError } from '../http/api-error';
import { ALL_ROLES, type RouteDef } from '../http/route';
import { resetMail } from '../mail/templates';
import { User } from '../users/user.entity';
import { toSessionUser } from '../users/user-views';
import { checkPassword, DUMMY_HASH, hashPassword } from './passwords';
import { PasswordReset } from './password-reset.entity';
import { hashSecretToken, newSecretToken } from './secret-token';
import { issueSession } from './session-token';

const RESET_TTL_MS = 60 * 60 * 1000;

export const authRoutes: RouteDef[] = [
  {
    method: 'post',
    path: '/api/auth/sign-in',
    summary: 'Sign in with e-mail and password; returns a session token.',
    roles: 'public',
    limited: true,
    body: signInSchema,
    async handler(req, res, ctx) {
      const { email, password } = req.body as SignInInput;
      const user = await ctx.ds.getRepository(User).findOne({ where: { email }, relations: { shop: true } });
      const ok = await checkPassword(password, user?.passwordHash ?? DUMMY_HASH);
      if (!user || !ok) throw new ApiError(401, 'wrong_credentials', 'That e-mail and password do not match. Check both and try again.');
      if (!user.active) throw new ApiError(401, 'deactivated', 'This account has been deactivated. Ask the shop owner.');
      res.json(issueSession(ctx, user));
    },
  },
  {
    method: 'get',
    path: '/api/auth/me',
    summary: 'The signed-in member and their shop.',
    roles: ALL_ROLES,
    handler(req, res) {
      res.json({ user: toSessionUser(req.member) });
    },
  },
  {
    method: 'post',
    path: '/api/auth/forgot-password',
    summary: 'Mail a single-use reset link if the address belongs to an active member. Always answers 202.',
    roles: 'public',
    limited: true,
    body: forgotPasswordSchema,
    async handler(req, res, ctx) {
      const { email } = req.body as ForgotPasswordInput;
      const user = await ctx.ds.getRepository(User).findOneBy({ email, active: true });
      if (user) {
        const { token, hash } = newSecretToken();
        const expiresAt = new Date(Date.now() + RESET_TTL_MS);
        await ctx.write((tx) => tx.getRepository(PasswordReset).save({ userId: user.id, tokenHash: hash, expiresAt, usedAt: null }));
        const link = `${ctx.publicUrl()}/reset-password?token=${token}`;
        try {
          await ctx.mailer.send({ shopId: user.shopId, to: user.email, ...resetMail({ name: user.name, link, expiresAt }) });
        } catch (err) {
          req.log.error({ err }, 'reset mail not sent');
        }
      }
      res.status(202).json({ ok: true });
    },
  },
  {
    method: 'post',
    path: '/api/auth/reset-password',
    summary: 'Set a new password with the token from a reset link; the link then stops working, and every session signed in before ends.',
    roles: 'public',
    limited: true,
    body: resetPasswordSchema,
    async handler(req, res, ctx) {
      const { token, password } = req.body as ResetPasswordInput;
      const passwordHash = await hashPassword(password);
      await ctx.write(async (tx) => {
        const reset = await tx.getRepository(PasswordReset).findOne({
          where: { tokenHash: hashSecretToken(token), usedAt: IsNull(), expiresAt: MoreThan(new Date()) },
          relations: { user: true },
        });
        if (!reset || !reset.user.active) {
          throw new ApiError(400, 'invalid_token', 'This reset link has expired or was already used. Ask for a new one.');
        }
        await tx.getRepository(PasswordReset).update({ userId: reset.userId, usedAt: IsNull() }, { usedAt: new Date() });
        // A new password ends every session signed in with the old one.
        await tx.getRepository(User).update({ id: reset.userId }, { passwordHash, sessionEpoch: () => '"sessionEpoch" + 1' });
      });
      res.status(204).end();
    },
  },
];
