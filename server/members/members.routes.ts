import { updateMemberSchema, type UpdateMemberInput } from '@shared/auth/schemas';
import type { Role } from '@shared/auth/roles';
import { ApiError, notFound } from '../http/api-error';
import type { RouteDef } from '../http/route';
import { User } from '../users/user.entity';
import { toMember } from '../users/user-views';

export const memberRoutes: RouteDef[] = [
  {
    method: 'get',
    path: '/api/members',
    summary: 'Members of the shop, active and deactivated.',
    roles: ['owner'],
    async handler(req, res, ctx) {
      const users = await ctx.ds.getRepository(User).find({ where: { shopId: req.member.shopId }, order: { name: 'ASC' } });
      res.json({ members: users.map(toMember) });
    },
  },
  {
    method: 'patch',
    path: '/api/members/:id',
    summary: "Change a member's role or deactivate/reactivate them; deactivation ends their sessions at once.",
    roles: ['owner'],
    body: updateMemberSchema,
    async handler(req, res, ctx) {
      const change = req.body as UpdateMemberInput;
      const updated = await ctx.write(async (tx) => {
        const repo = tx.getRepository(User);
        const user = await repo.findOneBy({ id: String(req.params.id), shopId: req.member.shopId });
        if (!user) throw notFound('member');
        const next = { role: (change.role ?? user.role) as Role, active: change.active ?? user.active };
        const losesOwner = user.role === 'owner' && user.active && (next.role !== 'owner' || !next.active);
        if (losesOwner) {
          const owners = await repo.countBy({ shopId: req.member.shopId, role: 'owner', active: true });
          if (owners <= 1) {
            throw new ApiError(409, 'last_owner', 'The shop needs at least one active owner. Make someone else owner first.');
          }
        }
        await repo.update({ id: user.id }, next);
        return { ...user, ...next };
      });
      res.json({ member: toMember(updated) });
    },
  },
];
