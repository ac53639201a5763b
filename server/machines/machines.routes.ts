import { machineSchema, type MachineInput } from '@shared/workshop/schemas';
import type { MachineView } from '@shared/api/workshop-types';
import { checkVin } from '@shared/engine/vin';
import { notFound } from '../http/api-error';
import type { RouteDef } from '../http/route';
import { answerOnce } from '../idempotency/with-idempotency';
import { Machine } from './machine.entity';

const RUNNERS = ['owner', 'lead', 'tech'] as const;

export const toMachineView = (m: Machine): MachineView => ({
  id: m.id,
  make: m.make,
  model: m.model,
  year: m.year,
  engine: m.engine,
  vin: m.vin,
  mileage: m.mileage,
  mileageUnit: m.mileageUnit as MachineView['mileageUnit'],
  vinWarning: vinWarning(m.vin),
  createdAt: m.createdAt.toISOString(),
});

export const machineRoutes: RouteDef[] = [
  {
    method: 'get',
    path: '/api/machines',
    summary: "The shop's machines, newest first.",
    roles: RUNNERS,
    async handler(req, res, ctx) {
      const machines = await ctx.ds.getRepository(Machine).find({ where: { shopId: req.member.shopId }, order: { createdAt: 'DESC' }, take: 500 });
      res.json({ machines: machines.map(toMachineView) });
    },
  },
  {
    method: 'post',
    path: '/api/machines',
    summary: 'Record a machine (make, model, year, engine, VIN, mileage). Honours Idempotency-Key.',
    roles: RUNNERS,
    body: machineSchema,
    async handler(req, res, ctx) {
      const input = req.body as MachineInput;
      await answerOnce(ctx, req, res, async (tx) => {
        const saved = await tx.getRepository(Machine).save({ ...input, shopId: req.member.shopId });
        return { status: 201, body: { machine: toMachineView(saved) } };
      });
    },
  },
  {
    method: 'get',
    path: '/api/machines/:id',
    summary: 'One machine.',
    roles: RUNNERS,
    async handler(req, res, ctx) {
      const m = await ctx.ds.getRepository(Machine).findOneBy({ id: String(req.params.id), shopId: req.member.shopId });
      if (!m) throw notFound('machine');
      res.json({ machine: toMachineView(m) });
    },
  },
];

function vinWarning(vin: string): string | null {
  if (!vin) return null;
  const check = checkVin(vin);
  return check.ok ? (check.warning ?? null) : check.message;
}
