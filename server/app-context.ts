import type { KeyObject } from 'node:crypto';
import type { DataSource } from 'typeorm';
import type { Logger } from 'pino';
import type { Config } from './config';
import type { Write, WriteSync } from './db/writer';
import type { Mailer } from './mail/mailer';

/** What every handler may use; built once per app (one per test file in tests). */
export interface AppContext {
  ds: DataSource;
  /** Runs a write transaction; all writes go through it (see db/writer.ts). */
  write: Write;
  /** Runs a synchronous transaction of prepared statements in the same queue (hot paths). */
  writeSync: WriteSync;
  config: Config;
  mailer: Mailer;
  log: Logger;
  /** HMAC key of session tokens. */
  jwtKey: KeyObject;
  /** Base of links in e-mail: PUBLIC_URL, or the address the server listens on. */
  publicUrl(): string;
}
