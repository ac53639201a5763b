import { meterSchema, type MeterInput } from '@shared/workshop/schemas';
import type { MeterView } from '@shared/api/workshop-types';
import type { RouteDef } from '../http/route';
import { Meter } from './meter.entity';

export const toMeterView = (m: Meter): MeterView => ({
  id: m.id,
  name: m.name,
  model: m.model,
  ranges: m.ranges,
  createdAt: m.createdAt.toISOString(),
});

export const meterRoutes: RouteDef[] = [
  {
    method: 'get',
    path: '/api/meters',
    summary: "The shop's meters with their accuracy per function and range.",
    roles: ['owner', 'lead', 'tech'],
    async handler(req, res, ctx) {
      const meters = await ctx.ds.getRepository(Meter).find({ where: { shopId: req.member.shopId, active: true }, order: { name: 'ASC' } });
      res.json({ meters: meters.map(toMeterView) });
    },
  },
  {
    method: 'post',
    path: '/api/meters',
    summary: 'Register a meter with its accuracy table (± % of reading + counts, per function and range).',
    roles: ['owner'],
    body: meterSchema,
    async handler(req, res, ctx) {
      const input = req.body as MeterInput;
      const saved = await ctx.write((tx) => tx.getRepository(Meter).save({ ...input, shopId: req.member.shopId, active: true }));
      res.status(201).json({ meter: toMeterView(saved) });
    },
  },
];
