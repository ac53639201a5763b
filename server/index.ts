import 'reflect-metadata';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import { createApp } from './app';
import { ConfigError, readConfig } from './config';
import { createRuntime } from './context';
import { openDatabase } from './db/data-source';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from './seed/demo-accounts';
import { seedDemo } from './seed/seed-demo';
import { ensureWebBuild } from './web/build-web';

const ROOT = path.resolve(__dirname, '..');

async function main() {
  const config = readConfig();
  if (config.buildWeb) ensureWebBuild(ROOT, (m) => console.log(m));
  const ds = await openDatabase(path.join(config.dataDir, 'probepath.sqlite'));
  const runtime = await createRuntime(config, ds);
  const seeded = config.seedDemo ? await seedDemo(ds, { dataDir: config.dataDir }) : false;
  const app = createApp(runtime.ctx, { webDir: path.join(ROOT, 'dist') });

  const server = app.listen(config.port, config.host, () => {
    const { port } = server.address() as AddressInfo;
    const url = `http://localhost:${port}`;
    runtime.setListenUrl(url);
    console.log(`\nProbepath is ready at ${url}`);
    console.log(`Data: ${config.dataDir}${seeded ? ' (demo shop seeded)' : ''}`);
    console.log(runtime.fakeSmtp ? `Mail: captured by the local fake (${runtime.fakeSmtp.url}); read it in Outbox.` : 'Mail: sent through SMTP_URL.');
    if (config.seedDemo) {
      console.log(`Demo accounts (password ${DEMO_PASSWORD}):`);
      for (const a of DEMO_ACCOUNTS) console.log(`  ${a.role.padEnd(10)} ${a.email}`);
    }
  });

  let closing = false;
  const shutdown = (signal: string) => {
    if (closing) return;
    closing = true;
    runtime.ctx.log.info({ signal }, 'shutting down');
    server.close(() => {
      runtime.close().finally(() => process.exit(0));
    });
    server.closeIdleConnections();
    setTimeout(() => process.exit(0), 5000);
  };
  process.on('SIGTERM', () => shutdown('SIGTERM'));
  process.on('SIGINT', () => shutdown('SIGINT'));
}

main().catch((err) => {
  console.error(err instanceof ConfigError ? err.message : err);
  process.exit(1);
});
