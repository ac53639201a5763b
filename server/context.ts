import crypto from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import pino from 'pino';
import type { DataSource } from 'typeorm';
import type { AppContext } from './app-context';
import type { Config } from './config';
import { createWriter } from './db/writer';
import { startFakeSmtp, type FakeSmtp } from './mail/fake-smtp';
import { createMailer } from './mail/mailer';

export interface Runtime {
  ctx: AppContext;
  fakeSmtp: FakeSmtp | null;
  /** Set once the server listens, for links in mail when PUBLIC_URL is unset. */
  setListenUrl(url: string): void;
  close(): Promise<void>;
}

/** Wires database, mail (the local fake unless SMTP_URL is set), logger and secret into one context. */
export async function createRuntime(config: Config, ds: DataSource): Promise<Runtime> {
  const log = pino({ level: config.logLevel });
  const { write, writeSync } = createWriter(ds);
  const fakeSmtp = config.smtpUrl ? null : await startFakeSmtp(write);
  const mailer = createMailer(config.smtpUrl ?? fakeSmtp!.url, config.mailFrom);
  let listenUrl = `http://localhost:${config.port}`;
  const ctx: AppContext = {
    ds,
    write,
    writeSync,
    config,
    mailer,
    log,
    // A KeyObject, not a string: jsonwebtoken otherwise tries (and fails) to parse a string as a PEM key on every verify.
    jwtKey: crypto.createSecretKey(Buffer.from(config.jwtSecret ?? persistentSecret(config.dataDir))),
    publicUrl: () => config.publicUrl ?? listenUrl,
  };
  return {
    ctx,
    fakeSmtp,
    setListenUrl: (url) => {
      listenUrl = url;
    },
    async close() {
      mailer.close();
      await fakeSmtp?.close();
      if (ds.isInitialized) await ds.destroy();
    },
  };
}

/** Without JWT_SECRET, a random secret is kept in the data folder so sessions survive a restart. */
function persistentSecret(dataDir: string): string {
  const file = path.join(dataDir, 'jwt-secret');
  if (fs.existsSync(file)) return fs.readFileSync(file, 'utf8').trim();
  fs.mkdirSync(dataDir, { recursive: true });
  const secret = crypto.randomBytes(48).toString('base64url');
  fs.writeFileSync(file, secret, { mode: 0o600 });
  return secret;
}
