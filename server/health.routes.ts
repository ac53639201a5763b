import type { RouteDef } from './http/route';

export const healthRoutes: RouteDef[] = [
  {
    method: 'get',
    path: '/api/health',
    summary: 'Liveness and database check.',
    roles: 'public',
    async handler(_req, res, ctx) {
      await ctx.ds.query('SELECT 1');
      res.json({ status: 'ok' });
    },
  },
];
