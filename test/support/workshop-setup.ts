import request from 'supertest';
import type { Role } from '@shared/auth/roles';

import { FIXTURE_METER, fixtureProcedure } from './fixture-procedure';

/** A meter, a machine with a job, and the fixture procedure published as version 1. */
export async function setUpWorkshop(h: { app: Parameters<typeof request>[0]; tokenFor(role: Role): Promise<string> }) {
  const owner = await h.tokenFor('owner');
  const lead = await h.tokenFor('lead');
  const auth = (t: string) => ({ authorization: `Bearer ${t}` });
  const meter = await request(h.app).post('/api/meters').set(auth(owner)).send(FIXTURE_METER);
  const machine = await request(h.app).post('/api/machines').set(auth(lead)).send({ make: 'Veltro', model: 'T650', year: 2019, vin: '7VLTR65A5TK104233', mileage: 21400 });
  const job = await request(h.app).post('/api/jobs').set(auth(lead)).send({ machineId: machine.body.machine.id, customerName: 'Ada Quill', complaint: 'Turns over, never catches' });
  const procedure = await request(h.app).post('/api/procedures').set(auth(lead)).send({ title: 'No spark', complaint: 'Cranks but no spark', family: 'Test twins' });
  const procedureId = procedure.body.procedure.id as string;
  await request(h.app).put(`/api/procedures/${procedureId}/draft`).set(auth(lead)).send({ revision: 1, document: fixtureProcedure() });
  const published = await request(h.app).post(`/api/procedures/${procedureId}/draft/publish`).set(auth(lead)).send({ revision: 2 });
  if (published.status !== 200) throw new Error(`publish failed: ${JSON.stringify(published.body)}`);
  return { meterId: meter.body.meter.id as string, machineId: machine.body.machine.id as string, jobId: job.body.job.id as string, procedureId };
}
