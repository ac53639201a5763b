import type { RouteDef } from './http/route';
import { buildOpenApi } from './openapi';
import { routeTable } from './route-table';

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
  {
    method: 'get',
    path: '/api/openapi.json',
    summary: 'This API described in OpenAPI 3.1, built from the route table.',
    roles: 'public',
    handler(_req, res) {
      res.json(buildOpenApi(routeTable));
    },
  },
];
