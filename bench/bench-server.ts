/**
 * One server for the step benchmark, run in its own process so the load
 * generator does not share its core: `bare` is a plain Express JSON endpoint,
 * `app` is Probepath with a file database, many diagnoses each waiting for its
 * first reading. Prints one JSON line with the port (and what the load needs).
 */
import 'reflect-metadata';
import crypto from 'node:crypto';
import fs from 'node:fs';
import type { AddressInfo } from 'node:net';
import os from 'node:os';
import path from 'node:path';
import express from 'express';
import request from 'supertest';
import { createApp } from '../server/app';
import { readConfig } from '../server/config';
import { createRuntime } from '../server/context';
import { openDatabase } from '../server/db/data-source';
import { seedDemo } from '../server/seed/seed-demo';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '../server/seed/demo-accounts';
import { setUpWorkshop } from '../test/support/workshop-setup';

const DIAGNOSES = Number(process.env.BENCH_DIAGNOSES ?? 60000);

async function main() {
  const mode = process.argv[2];
  if (mode === 'bare') {
    const app = express();
    app.use(express.json());
    app.post('/echo/:id', (req, res) => {
      res.status(201).json({ id: req.params.id, checkId: req.body.checkId, reading: req.body.reading });
    });
    const server = app.listen(0, '127.0.0.1', () => console.log(JSON.stringify({ port: (server.address() as AddressInfo).port })));
    return;
  }
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'probepath-bench-'));
  const config = readConfig({ DATA_DIR: dataDir, LOG_LEVEL: 'silent', JWT_SECRET: 'bench-secret-'.padEnd(48, 'x'), SEED_DEMO: '0' });
  const ds = await openDatabase(path.join(dataDir, 'bench.sqlite'));
  const runtime = await createRuntime(config, ds);
  await seedDemo(ds, { workshop: false });
  const app = createApp(runtime.ctx);
  const tokenFor = async (role: string) => {
    const email = DEMO_ACCOUNTS.find((a) => a.role === role)!.email;
    return (await request(app).post('/api/auth/sign-in').send({ email, password: DEMO_PASSWORD })).body.token as string;
  };
  const ids = await setUpWorkshop({ app, tokenFor });
  const tech = await tokenFor('tech');
  const first = await request(app).post('/api/diagnoses').set('authorization', `Bearer ${tech}`).send({ procedureId: ids.procedureId, jobId: ids.jobId, meterId: ids.meterId, ambientC: 21 });
  // Clone the started diagnosis so every request of the load has its own one waiting at the first check.
  const template = (await ds.query('SELECT * FROM diagnosis WHERE id = ?', [first.body.diagnosis.id]))[0];
  const cols = Object.keys(template);
  const insert = `INSERT INTO diagnosis (${cols.map((c) => `"${c}"`).join(',')}) VALUES (${cols.map(() => '?').join(',')})`;
  const diagnosisIds: string[] = [];
  await ds.transaction(async (tx) => {
    for (let i = 0; i < DIAGNOSES; i++) {
      const id = crypto.randomUUID();
      diagnosisIds.push(id);
      await tx.query(insert, cols.map((c) => (c === 'id' ? id : template[c])));
    }
  });
  const idFile = path.join(dataDir, 'diagnoses.json');
  fs.writeFileSync(idFile, JSON.stringify(diagnosisIds));
  const server = app.listen(0, '127.0.0.1', () => console.log(JSON.stringify({ port: (server.address() as AddressInfo).port, token: tech, idFile })));
}

process.on('SIGINT', () => process.exit(0));

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
